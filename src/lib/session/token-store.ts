import AsyncStorage from '@react-native-async-storage/async-storage';
import type { StoredSession } from './stored-session';

const KEY = 'strapsift.session';

/** Native builds keep the session in AsyncStorage; the web build has its own file. */
export const tokenStore = {
  async load(): Promise<StoredSession | null> {
    const raw = await AsyncStorage.getItem(KEY);
    return raw ? (JSON.parse(raw) as StoredSession) : null;
  },
  async save(session: StoredSession): Promise<void> {
    await AsyncStorage.setItem(KEY, JSON.stringify(session));
  },
  async clear(): Promise<void> {
    await AsyncStorage.removeItem(KEY);
  },
};
