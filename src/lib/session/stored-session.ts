export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  role: 'collector' | 'admin';
}

export interface StoredSession {
  token: string;
  refreshToken: string;
  user: SessionUser;
}
