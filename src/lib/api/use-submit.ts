import { useCallback, useState } from 'react';
import { ApiError } from './api-error';

/** Busy flag, a top-line message and per-field messages for one form's submit. */
export function useSubmit<A extends unknown[], R>(action: (...args: A) => Promise<R>) {
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string>>({});

  const submit = useCallback(
    async (...args: A): Promise<R | undefined> => {
      setBusy(true);
      setMessage(null);
      setFields({});
      try {
        return await action(...args);
      } catch (error) {
        if (error instanceof ApiError) {
          setMessage(error.message);
          setFields(error.fields);
        } else {
          setMessage('Something went wrong; please try again.');
        }
        return undefined;
      } finally {
        setBusy(false);
      }
    },
    [action],
  );
  return { submit, busy, message, fields, setMessage };
}
