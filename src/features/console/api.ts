import useSWR, { mutate } from 'swr';
import { adminStats, adminUser, adminUserPage } from '@shared/contracts';
import { api } from '@/lib/api/client';

export const consoleKeys = {
  users: (query: string) => (query ? `/admin/users?query=${encodeURIComponent(query)}` : '/admin/users'),
  stats: '/admin/stats',
};

export function useAdminUsers(query: string) {
  return useSWR(consoleKeys.users(query), (path: string) => api(path, { schema: adminUserPage }));
}

export function useAdminStats() {
  return useSWR(consoleKeys.stats, (path: string) => api(path, { schema: adminStats }));
}

export async function setUserDisabled(id: string, disabled: boolean) {
  const user = await api(`/admin/users/${id}`, { method: 'PATCH', body: { disabled }, schema: adminUser });
  await mutate((key) => typeof key === 'string' && key.startsWith('/admin/'));
  return user;
}
