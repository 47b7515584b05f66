/** What every failed API call becomes, so screens can show the server's words and field errors. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }

  /** No answer at all: the device is offline or the server is unreachable. */
  get isNetwork(): boolean {
    return this.status === 0;
  }
}
