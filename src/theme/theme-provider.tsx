import { createContext, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { useColorScheme } from 'react-native';
import { kv } from '../lib/storage/kv';
import { darkTheme, lightTheme, type Theme } from './themes';

export type ThemePreference = 'system' | 'light' | 'dark';

interface ThemeState {
  theme: Theme;
  preference: ThemePreference;
  setPreference(preference: ThemePreference): void;
}

const ThemeContext = createContext<ThemeState>({ theme: lightTheme, preference: 'system', setPreference: () => undefined });
const KEY = 'strapsift.theme';

export function ThemeProvider({ children }: { children: ReactNode }) {
  const system = useColorScheme();
  const [preference, setPreferenceState] = useState<ThemePreference>('system');

  useEffect(() => {
    void kv.get<ThemePreference>(KEY).then((saved) => {
      if (saved === 'light' || saved === 'dark' || saved === 'system') setPreferenceState(saved);
    });
  }, []);

  const value = useMemo<ThemeState>(() => {
    const mode = preference === 'system' ? (system === 'dark' ? 'dark' : 'light') : preference;
    return {
      theme: mode === 'dark' ? darkTheme : lightTheme,
      preference,
      setPreference: (next) => {
        setPreferenceState(next);
        void kv.set(KEY, next);
      },
    };
  }, [preference, system]);
  return <ThemeContext.Provider value={value}>{children}</ThemeContext.Provider>;
}

export function useThemeState(): ThemeState {
  return useContext(ThemeContext);
}

export function useTheme(): Theme {
  return useContext(ThemeContext).theme;
}
