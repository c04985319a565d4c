/**
 * What the quote editor offers for each end: every active spring of the end's fit, the sizing's own
 * pick marked whatever its verdict, while a new draft swaps only the ends whose verdict asks for it.
 * The picks are read from the saved record, so the check follows the engine's answer.
 */
import type { CandidateResult, EndResult } from '../../../shared/types/sizing';
import { makeTestContext, TestContext } from '../test-context';
import { DeskShop, setUpDeskShop } from './helpers';

let t: TestContext;
let shop: DeskShop;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpDeskShop(t);
});
afterAll(() => t.dispose());

const pickOf = (end: EndResult): CandidateResult | null => end.recommendation.inStock ?? end.recommendation.best;

test('the options mark the sizing pick of each end, and the draft swaps only ends not to keep', async () => {
  const record = (await shop.asRider.get(`/sizing-records/${shop.recordId}`).expect(200)).body.record;
  const quote = (await shop.asDesk.post('/quotes', { sizingRecordId: shop.recordId }).expect(201)).body.quote;
  const options = (await shop.asDesk.get(`/quotes/${quote.id}/spring-options`).expect(200)).body;
  // The fixture's fork sits inside the road windows (28-33 % rider, 15-22 % static sag): rider sag
  // (180 - 141) / 120 = 32.5 %, static (180 - 160) / 120 = 16.7 %, so its spring is kept.
  expect(record.result.front.verdict).toBe('keep');
  expect(options.front.some((o: { recommended: boolean }) => o.recommended)).toBe(true);
  for (const end of ['front', 'rear'] as const) {
    const result: EndResult = record.result[end];
    const marked = options[end].filter((o: { recommended: boolean }) => o.recommended).map((o: { sku: string }) => o.sku);
    expect(marked).toEqual(pickOf(result) ? [pickOf(result)!.sku] : []);
    const drafted = quote.lines.filter((l: { kind: string; end: string }) => l.kind === 'spring' && l.end === end);
    expect(drafted.length > 0).toBe(result.verdict !== 'keep' && pickOf(result) !== null);
  }
});
