import type { RequestHandler } from 'express';
import { HttpError, type FieldErrors } from './errors';

/** Fields whose text may run over several lines; everywhere else a line break is as wrong as a NUL. */
const MULTI_LINE_FIELDS = new Set(['note', 'notes']);

// C0 controls except tab/LF/CR, DEL, and the C1 block: never meaningful in a hunter's text, and NUL
// makes PostgreSQL refuse the whole statement.
// eslint-disable-next-line no-control-regex -- control characters are exactly what this looks for
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;
// eslint-disable-next-line no-control-regex -- as above, with tab and line breaks
const CONTROL_OR_BREAK = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/;

function walk(value: unknown, path: string[], fields: FieldErrors, depth = 0): void {
  if (depth > 50 || Object.keys(fields).length >= 20) return;
  if (typeof value === 'string') {
    const last = path[path.length - 1] ?? '';
    const allowsBreaks = MULTI_LINE_FIELDS.has(last);
    // Multi-line fields take \n and \r\n, nothing else below U+0020 but those.
    const bad = allowsBreaks ? CONTROL.test(value) || /\t/.test(value) : CONTROL_OR_BREAK.test(value);
    if (bad) {
      fields[path.join('.') || '_'] = allowsBreaks
        ? 'must not contain control characters (line breaks are fine)'
        : 'must not contain control characters or line breaks';
    }
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((item, index) => walk(item, [...path, String(index)], fields, depth + 1));
    return;
  }
  if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) walk(item, [...path, key], fields, depth + 1);
  }
}

/**
 * Every text in a JSON body or the query string is checked once, here, before any route sees it: a NUL
 * or other control character gets a 400 naming the field instead of a database error.
 */
export const rejectControlCharacters: RequestHandler = (req, _res, next) => {
  const fields: FieldErrors = {};
  walk(req.body, [], fields);
  walk(req.query, [], fields);
  if (Object.keys(fields).length) {
    next(new HttpError(400, 'invalid', 'Some fields need attention', fields));
    return;
  }
  next();
};
