import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useTheme } from '../../theme/theme-provider';
import { space } from '../../theme/tokens';
import { Button } from './button';
import { Notice } from './notice';
import { Text } from './text';

interface AsyncBlockProps<T> {
  /** What is loading, in words: "strap sheet", "crew". */
  what: string;
  data: T | undefined;
  error: unknown;
  /** Asks again after an error. */
  retry(): void;
  children(data: T): ReactNode;
}

/**
 * The three states of anything fetched, in one place: the data when it is there (kept while a
 * refresh fails, so a flaky connection never blanks a screen), else the error with a retry, else a
 * spinner that says what it waits for.
 */
export function AsyncBlock<T>({ what, data, error, retry, children }: AsyncBlockProps<T>) {
  const theme = useTheme();
  if (data !== undefined) return <>{children(data)}</>;
  if (error) {
    return (
      <View style={styles.gap}>
        <Notice tone="error" title={`The ${what} could not be loaded`}>
          {error instanceof Error ? error.message : 'Something went wrong.'}
        </Notice>
        <Button kind="secondary" compact label="Try again" onPress={retry} style={styles.alignStart} />
      </View>
    );
  }
  return (
    <View style={styles.loading} accessibilityLabel={`Loading the ${what}`}>
      <ActivityIndicator color={theme.brand} />
      <Text tone="muted">Loading the {what}…</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  loading: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.md },
  gap: { gap: space.sm },
  alignStart: { alignSelf: 'flex-start' },
});
