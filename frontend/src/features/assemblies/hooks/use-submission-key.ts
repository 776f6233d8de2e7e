import { useCallback, useRef, useState } from 'react';
import { newSubmissionKey } from '../api/submit-once';

/**
 * One key per submission of a form, kept across every retry of it (a double tap, an automatic
 * retry, the person pressing again after no answer) so the server does the work once. `renew`
 * starts a new submission, after the server has answered.
 */
export function useSubmissionKey() {
  const [key, setKey] = useState(newSubmissionKey);
  const inFlight = useRef(false);
  const renew = useCallback(() => setKey(newSubmissionKey()), []);

  /** Runs `send` unless a send with this key is still waiting for its answer; a second tap does nothing. */
  const once = useCallback(async (send: (key: string) => Promise<unknown>) => {
    if (inFlight.current) return;
    inFlight.current = true;
    try {
      await send(key);
    } catch {
      // The caller's mutation shows the error; the key stays for the retry.
    } finally {
      inFlight.current = false;
    }
  }, [key]);

  return { key, renew, once };
}
