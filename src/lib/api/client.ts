import type { z } from 'zod';
import { ApiError } from './api-error';

export { ApiError };

type TokenSource = {
  getAccessToken(): string | null;
  /** Called once on a 401; returns a fresh token or null when the session is over. */
  refresh(): Promise<string | null>;
  onSignedOut(): void;
};

let tokens: TokenSource = {
  getAccessToken: () => null,
  refresh: async () => null,
  onSignedOut: () => undefined,
};

/** The session provider plugs itself in here, so the client never imports React state. */
export function connectTokenSource(source: TokenSource): void {
  tokens = source;
}

// Same origin on the web export; a native build sets EXPO_PUBLIC_API_URL.
const baseUrl = (process.env.EXPO_PUBLIC_API_URL ?? '').replace(/\/$/, '');

export interface RequestOptions<T> {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  /** The shared zod contract of the answer; a mismatch is reported, never passed on silently. */
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
  /** Send without the Authorization header (sign-in, register). */
  anonymous?: boolean;
  /** Raw body such as FormData; sent as is. */
  rawBody?: BodyInit;
  /** What to ask the server for; JSON unless said otherwise. */
  accept?: string;
}

async function send(path: string, options: RequestOptions<unknown>, token: string | null): Promise<Response> {
  const headers: Record<string, string> = { Accept: options.accept ?? 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (token && !options.anonymous) headers.Authorization = `Bearer ${token}`;
  try {
    return await fetch(`${baseUrl}/api${path}`, {
      method: options.method ?? (options.body !== undefined || options.rawBody ? 'POST' : 'GET'),
      headers,
      body: options.rawBody ?? (options.body !== undefined ? JSON.stringify(options.body) : undefined),
      signal: options.signal,
    });
  } catch (error) {
    if ((error as Error)?.name === 'AbortError') throw error;
    throw new ApiError(0, 'offline', 'No connection to Strapsift right now');
  }
}

async function sendWithRefresh(path: string, options: RequestOptions<unknown>): Promise<Response> {
  let response = await send(path, options, tokens.getAccessToken());
  if (response.status === 401 && !options.anonymous) {
    const fresh = await tokens.refresh();
    if (fresh) response = await send(path, options, fresh);
    if (response.status === 401) tokens.onSignedOut();
  }
  return response;
}

async function failure(response: Response): Promise<ApiError> {
  let error: { code?: string; message?: string; fields?: Record<string, string> } | undefined;
  try {
    error = ((await response.json()) as { error?: typeof error } | null)?.error;
  } catch {
    error = undefined;
  }
  return new ApiError(response.status, error?.code ?? 'http_error', error?.message ?? `The server answered ${response.status}`, error?.fields ?? {});
}

/**
 * Bytes from the API with the caller's session (photos, export files): an <img> or a link cannot send
 * the Authorization header, so these come through here and are handed to the page as a Blob.
 */
export async function apiBlob(path: string, options: Pick<RequestOptions<unknown>, 'signal' | 'anonymous'> = {}): Promise<Blob> {
  const response = await sendWithRefresh(path, options);
  if (!response.ok) throw await failure(response);
  return response.blob();
}

/** The one typed way to call the API. Components call hooks that call this; nothing else calls fetch. */
export async function api<T = unknown>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const response = await sendWithRefresh(path, options as RequestOptions<unknown>);
  const text = await response.text();
  let payload: unknown = null;
  if (text) {
    try {
      payload = JSON.parse(text);
    } catch {
      payload = null;
    }
  }
  if (!response.ok) {
    const error = (payload as { error?: { code?: string; message?: string; fields?: Record<string, string> } } | null)?.error;
    throw new ApiError(
      response.status,
      error?.code ?? 'http_error',
      error?.message ?? `The server answered ${response.status}`,
      error?.fields ?? {},
    );
  }
  if (!options.schema) return payload as T;
  const parsed = options.schema.safeParse(payload);
  if (!parsed.success) {
    throw new ApiError(response.status, 'bad_response', 'The server sent an answer this version of the app does not understand');
  }
  return parsed.data;
}

/** An API path as the server writes it in answers (`/api/…`), made absolute for an image source. */
export function absoluteApiUrl(apiPath: string): string {
  return `${baseUrl}${apiPath}`;
}

/** An image source that carries the session, for platforms whose <Image> can send headers (native). */
export function authedImageSource(apiPath: string): { uri: string; headers: Record<string, string> } {
  const token = tokens.getAccessToken();
  return { uri: absoluteApiUrl(apiPath), headers: token ? { Authorization: `Bearer ${token}` } : {} };
}

/** Reads a streamed body chunk by chunk, telling `onChunk` about each as it arrives. */
async function readBody(response: Response, onChunk: (chunk: Uint8Array) => void): Promise<void> {
  const reader = response.body?.getReader();
  if (!reader) {
    onChunk(new Uint8Array(await response.arrayBuffer()));
    return;
  }
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return;
    if (value) onChunk(value);
  }
}

/** Like apiBlob, for large downloads: `onProgress` hears the bytes received so far. */
export async function apiDownload(path: string, onProgress: (received: number) => void): Promise<Blob> {
  const response = await sendWithRefresh(path, {});
  if (!response.ok) throw await failure(response);
  const parts: Uint8Array[] = [];
  let received = 0;
  await readBody(response, (chunk) => {
    parts.push(chunk);
    received += chunk.length;
    onProgress(received);
  });
  return new Blob(parts as BlobPart[], { type: response.headers.get('Content-Type') ?? 'application/octet-stream' });
}

/**
 * A request whose answer is a stream of JSON lines (a long restore reporting each part). Each line is
 * parsed with `schema` and handed to `onLine`; an error status is thrown as an ApiError as usual.
 */
export async function apiLines<T>(path: string, options: RequestOptions<T> & { schema: z.ZodType<T> }, onLine: (line: T) => void): Promise<void> {
  const response = await sendWithRefresh(path, { ...(options as RequestOptions<unknown>), accept: 'application/x-ndjson' });
  if (!response.ok) throw await failure(response);
  const decoder = new TextDecoder();
  let pending = '';
  const take = (text: string) => {
    const parsed = options.schema.safeParse(JSON.parse(text));
    if (!parsed.success) throw new ApiError(response.status, 'bad_response', 'The server sent an answer this version of the app does not understand');
    onLine(parsed.data);
  };
  await readBody(response, (chunk) => {
    pending += decoder.decode(chunk, { stream: true });
    const lines = pending.split('\n');
    pending = lines.pop() ?? '';
    for (const line of lines) if (line.trim()) take(line);
  });
  if (pending.trim()) take(pending);
}
