import { authResponse, undoEmailResponse, type LoginRequest, type RegisterRequest } from '@shared/contracts/auth';
import { api } from '@/lib/api/client';

export const signInRequest = (body: LoginRequest) =>
  api('/auth/login', { method: 'POST', body, anonymous: true, schema: authResponse });

export const createAccountRequest = (body: RegisterRequest) =>
  api('/auth/register', { method: 'POST', body, anonymous: true, schema: authResponse });

export const forgotPasswordRequest = (email: string) =>
  api('/auth/forgot', { method: 'POST', body: { email }, anonymous: true });

export const resetPasswordRequest = (token: string, password: string) =>
  api('/auth/reset', { method: 'POST', body: { token, password }, anonymous: true });

export const undoEmailChangeRequest = (token: string) =>
  api('/auth/undo-email-change', { method: 'POST', body: { token }, anonymous: true, schema: undoEmailResponse });
