import type { z } from 'zod';
import { invalid } from './errors';

/** Parses a body, query or params with its shared contract; a mismatch becomes a 400 naming each field. */
export function parse<T extends z.ZodTypeAny>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw invalid(result.error);
  return result.data;
}
