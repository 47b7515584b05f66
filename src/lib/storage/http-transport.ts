import { api } from '../api/client';
import { ApiError } from '../api/api-error';
import type { BatchAnswer, QueueTransport } from './scan-queue';

/** The app's transport: the batch route for notes, the delete route for undone ones. */
export const httpTransport: QueueTransport = {
  upload: (scans) => api<BatchAnswer>('/scans/batch', { method: 'POST', body: { scans } }),
  async remove(id) {
    try {
      await api(`/scans/${id}`, { method: 'DELETE' });
    } catch (error) {
      // Already gone (another device, or an earlier try that lost its answer) is success.
      if (error instanceof ApiError && error.status === 404) return;
      throw error;
    }
  },
};
