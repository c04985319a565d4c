/**
 * The demo shop driven over HTTP, as its people would: sign-in, a rider's bike, weigh-in and saved
 * pass, and a desk quote for springs that are on the shelf. Every call fails the test on an error answer.
 */
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../../server/seed/demo-accounts';
import type { Role } from '../../../shared/types/roles';
import { call } from '../../support/api-call';

export async function signIn(base: string, role: Role): Promise<string> {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role)!;
  return (await call<{ token: string }>(base, 'POST', '/auth/sign-in', undefined, { email: account.email, password: DEMO_PASSWORD })).token;
}

/** The demo rider's new bike from the first demo model and a pass sized from the weights alone. */
export async function riderPass(base: string, riderToken: string): Promise<number> {
  const { models } = await call<{ models: { id: number }[] }>(base, 'GET', '/bike-models', riderToken);
  const { bike } = await call<{ bike: { id: number } }>(base, 'POST', '/bikes', riderToken, { modelId: models[0].id, nickname: 'Reliability bike' });
  const weighIn = { bodyKg: 88, gear: {}, loads: [], discipline: 'road', position: 'neutral' };
  await call(base, 'PUT', '/weigh-in', riderToken, weighIn);
  const { record } = await call<{ record: { id: number } }>(base, 'POST', `/bikes/${bike.id}/sizing-records`, riderToken, { ends: ['front', 'rear'], weighIn });
  return record.id;
}

interface SpringOption {
  springId: number;
  sku: string;
  available: number;
}

export interface QuotedSprings {
  front: SpringOption;
  rear: SpringOption;
}

/** A draft quote on the pass with the labour of a spring swap only; its spring options, to choose from. */
export async function springsForPass(base: string, deskToken: string, recordId: number): Promise<QuotedSprings> {
  const { quote } = await call<{ quote: { id: number } }>(base, 'POST', '/quotes', deskToken, { sizingRecordId: recordId, lines: [{ kind: 'labour', operationCode: 'sag-setup' }] });
  const options = await call<{ front: SpringOption[]; rear: SpringOption[] }>(base, 'GET', `/quotes/${quote.id}/spring-options`, deskToken);
  const pick = (list: SpringOption[], end: string) => {
    const best = [...list].sort((a, b) => b.available - a.available)[0];
    if (!best) throw new Error(`the demo catalogue has no ${end} spring for the demo bike`);
    return best;
  };
  return { front: pick(options.front, 'front'), rear: pick(options.rear, 'rear') };
}

/** Two fork springs and one shock spring with their swaps, sent to the rider: ready to accept. */
export async function sentSpringQuote(base: string, deskToken: string, recordId: number, springs: QuotedSprings): Promise<{ id: number; number: string }> {
  const lines = [
    { kind: 'spring', springId: springs.front.springId, end: 'front', quantity: 2 },
    { kind: 'labour', operationCode: 'fork-spring-swap' },
    { kind: 'spring', springId: springs.rear.springId, end: 'rear', quantity: 1 },
    { kind: 'labour', operationCode: 'shock-spring-swap' },
  ];
  const { quote } = await call<{ quote: { id: number; number: string } }>(base, 'POST', '/quotes', deskToken, { sizingRecordId: recordId, lines });
  await call(base, 'POST', `/quotes/${quote.id}/send`, deskToken);
  return quote;
}

/** Waits until the server has printed text matching `pattern`; answers the match. */
export async function waitForOutput(output: () => string, pattern: RegExp, timeoutMs: number): Promise<RegExpExecArray> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const match = pattern.exec(output());
    if (match) return match;
    if (Date.now() > deadline) throw new Error(`the server did not print ${pattern} within ${timeoutMs} ms:\n${output()}`);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}
