/**
 * Whether this browser may hold a session worth restoring. The refresh cookie is httpOnly, so the
 * page cannot see it; without this hint every visit of someone who never signed in would ask the
 * server for a refresh, and the browser logs the expected 401 as a console error. The hint holds
 * no secret: the cookie alone proves the session.
 */
const KEY = 'sagwright.session';

export function mayHaveSession(): boolean {
  try {
    return globalThis.localStorage?.getItem(KEY) === '1';
  } catch {
    // Storage switched off (a private window, say): ask the server every time.
    return true;
  }
}

export function rememberSession(present: boolean): void {
  try {
    if (present) globalThis.localStorage?.setItem(KEY, '1');
    else globalThis.localStorage?.removeItem(KEY);
  } catch {
    // Without storage the next visit simply asks the server.
  }
}
