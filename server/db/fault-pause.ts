/**
 * The reliability tests' hook: with SAGWRIGHT_FAULT_PAUSE naming a point (test only; readConfig
 * refuses it in production), the write transaction that reaches that point prints a marker and
 * never finishes. A test that reads the marker knows the operation has written everything and not
 * committed, so a SIGKILL sent then falls between the two.
 */
import { FaultPoint, readConfig } from '../env';

const pause = readConfig().faultPause;

export const FAULT_MARKER = 'fault pause:';

/** Resolves at once, unless this process was started to hold its transactions at `point`. */
export function pauseForFault(point: FaultPoint, detail: string): Promise<void> {
  if (pause !== point) return Promise.resolve();
  console.log(`${FAULT_MARKER} ${point} (${detail}), holding the transaction open`);
  return new Promise(() => {});
}
