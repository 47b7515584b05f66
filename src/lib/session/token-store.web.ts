import type { StoredSession } from './stored-session';

const KEY = 'strapsift.session';

// localStorage answers synchronously, so a reload shows the signed-in app without a flash of the sign-in page.
function storage(): Storage | null {
  try {
    return typeof window !== 'undefined' ? window.localStorage : null;
  } catch {
    return null;
  }
}

export const tokenStore = {
  async load(): Promise<StoredSession | null> {
    const raw = storage()?.getItem(KEY);
    if (!raw) return null;
    try {
      return JSON.parse(raw) as StoredSession;
    } catch {
      return null;
    }
  },
  async save(session: StoredSession): Promise<void> {
    storage()?.setItem(KEY, JSON.stringify(session));
  },
  async clear(): Promise<void> {
    storage()?.removeItem(KEY);
  },
};
