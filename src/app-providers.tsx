import type { ReactNode } from 'react';
import { SWRConfig } from 'swr';
import { ApiError } from './lib/api/api-error';
import { SessionProvider } from './lib/session/session-provider';
import { useFocusRing } from './theme/focus-ring';
import { ThemeProvider } from './theme/theme-provider';

const swrOptions = {
  revalidateOnFocus: true,
  // A hunter's own mistakes (4xx) won't fix themselves by retrying; network trouble might.
  shouldRetryOnError: (error: unknown) => !(error instanceof ApiError) || error.isNetwork || error.status >= 500,
  errorRetryCount: 3,
};

function FocusRing() {
  useFocusRing();
  return null;
}

export function AppProviders({ children }: { children: ReactNode }) {
  return (
    <ThemeProvider>
      <FocusRing />
      <SessionProvider>
        <SWRConfig value={swrOptions}>{children}</SWRConfig>
      </SessionProvider>
    </ThemeProvider>
  );
}
