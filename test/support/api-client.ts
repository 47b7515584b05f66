import { expect } from 'vitest';
import { baseUrl } from './browser';

/** Signs in through the real API of the served app and returns a small authorised fetch helper. */
export async function apiAs(email: string, password: string) {
  const login = await fetch(`${baseUrl()}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!login.ok) throw new Error(`sign-in failed: ${login.status}`);
  const { token } = (await login.json()) as { token: string };
  return async function call<T = unknown>(path: string, init: RequestInit = {}): Promise<{ status: number; body: T }> {
    const response = await fetch(`${baseUrl()}/api${path}`, {
      ...init,
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}`, ...(init.headers ?? {}) },
    });
    const text = await response.text();
    return { status: response.status, body: (text ? JSON.parse(text) : null) as T };
  };
}

/** A brand-new collector registered through the served app's API, as a first visit would make one. */
export async function newCollector(label: string): Promise<{ email: string; password: string }> {
  const email = `${label}-${Math.random().toString(36).slice(2, 10)}@strapsift.test`;
  const password = 'new-hunter-pass-1';
  const registered = await fetch(`${baseUrl()}/api/auth/register`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password, displayName: 'New Hunter' }),
  });
  if (registered.status !== 201) throw new Error(`registering ${email} failed: ${registered.status}`);
  return { email, password };
}

/** A fresh collector with one keeper, made through the served app's API. */
export async function collectorWithKeeper(label: string) {
  const email = `${label}-${Math.random().toString(36).slice(2, 10)}@strapsift.test`;
  const password = 'photo-test-pass-1';
  const registered = await fetch(`${baseUrl()}/api/auth/register`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password, displayName: 'Photo Tester' }),
  });
  expect(registered.status).toBe(201);
  const call = await apiAs(email, password);
  const keeper = await call<{ id: string; digits: string }>('/keepers', {
    method: 'POST',
    body: JSON.stringify({ serial: 'ML 24242424 C', series: '2017A', grade: 64, estimatedValueCents: 2500, notes: 'kept in the blue album' }),
  });
  expect(keeper.status).toBe(201);
  return { email, password, call, keeper: keeper.body };
}
