/**
 * Stands in for zod's list of every message locale in the web bundle (see metro.config.js).
 * Strapsift writes its own messages in English, so English is the one locale the browser needs.
 */
export { default as en } from 'zod/v4/locales/en.js';
