// The parts of autocannon test/load/load.ts uses (its own types package lags the library).
declare module 'autocannon' {
  interface RawRequest {
    method?: string;
    path?: string;
    body?: string;
    headers?: Record<string, string>;
  }
  interface RequestSpec extends RawRequest {
    setupRequest?: (request: RawRequest, context: Record<string, unknown>) => RawRequest | null;
  }
  interface Client {
    setHeaders(headers: Record<string, string>): void;
    setRequests(requests: RequestSpec[]): void;
    on(event: 'response', listener: (statusCode: number, resBytes: number, responseTime: number) => void): void;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    connectionRate?: number;
    setupClient?: (client: Client) => void;
  }
  interface Result {
    requests: { total: number; average: number };
    errors: number;
    timeouts: number;
    non2xx: number;
  }
  export default function autocannon(options: Options): Promise<Result>;
}
