/**
 * Whether this device may hold a session worth restoring. Natively the app always asks the
 * server; the web build keeps a hint (session-hint.web.ts).
 */
export function mayHaveSession(): boolean {
  return true;
}

export function rememberSession(_present: boolean): void {}
