import { z } from 'zod';

/** One message per field, as forms and the API's 400 answers show them. */
export type FieldErrors = Record<string, string>;

/**
 * The first message for each top-level field of a flat form, through zod's own `z.flattenError`;
 * messages about the whole form land under "_".
 *
 * @example
 * flatFieldErrors(schema.safeParse({ swappedIn: 'x' }).error!) // { swappedIn: 'must be a whole number' }
 */
export function flatFieldErrors(error: z.ZodError): FieldErrors {
  const { formErrors, fieldErrors } = z.flattenError(error);
  const fields: FieldErrors = {};
  if (formErrors[0]) fields._ = formErrors[0];
  for (const [field, messages] of Object.entries(fieldErrors) as [string, string[] | undefined][]) {
    if (messages?.[0]) fields[field] = messages[0];
  }
  return fields;
}

/**
 * The first message for each field by its full path ("scans.1.id", "weights.patterns.radar"), for
 * bodies with nested lists and objects, where `z.flattenError` would keep only the top-level key.
 */
export function nestedFieldErrors(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) fields[issue.path.length ? issue.path.join('.') : '_'] ??= issue.message;
  return fields;
}
