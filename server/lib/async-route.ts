import type { NextFunction, Request, RequestHandler, Response } from 'express';

/** Express 5 forwards rejected promises itself; this only keeps handler types tidy. */
export function route(handler: (req: Request, res: Response, next: NextFunction) => Promise<unknown> | unknown): RequestHandler {
  return (req, res, next) => {
    Promise.resolve(handler(req, res, next)).catch(next);
  };
}
