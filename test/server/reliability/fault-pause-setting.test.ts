/** SAGWRIGHT_FAULT_PAUSE, the reliability tests' hold inside a write: refused in production and for an unknown point. */
import { readConfig } from '../../../server/env';

test('a known point is read outside production', () => {
  expect(readConfig({ NODE_ENV: 'test', SAGWRIGHT_FAULT_PAUSE: 'import-written' }).faultPause).toBe('import-written');
  expect(readConfig({ NODE_ENV: 'test' }).faultPause).toBeUndefined();
});

test('production refuses to start with it, and an unknown point is refused with the known ones named', () => {
  expect(() => readConfig({ NODE_ENV: 'production', SAGWRIGHT_FAULT_PAUSE: 'import-written' })).toThrow(/refused in production/);
  expect(() => readConfig({ NODE_ENV: 'test', SAGWRIGHT_FAULT_PAUSE: 'commit' })).toThrow(/one of import-written, quote-accept-written, not "commit"/);
});
