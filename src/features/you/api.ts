import { publicUser, type UpdateMeRequest } from '@shared/contracts';
import { api } from '@/lib/api/client';

export const updateMe = (body: UpdateMeRequest) => api('/me', { method: 'PATCH', body, schema: publicUser });
export const deleteMe = () => api('/me', { method: 'DELETE' });
