/** A quote as the server sends it, with sums worked by hand (21% tax on 100.00 + 23.45). */
import type { QuoteSummary, QuoteView } from '@shared/types/quote';

export function quoteView(overrides: Partial<QuoteView> = {}): QuoteView {
  return {
    id: 7,
    number: 'Q-0007',
    version: 1,
    previousId: null,
    supersededById: null,
    status: 'sent',
    rider: { id: 1, name: 'Mara Linden', email: 'rider@demo.test' },
    bikeId: 3,
    bikeName: 'Blue one',
    sizingRecordId: 11,
    currency: 'EUR',
    shop: { name: 'Demo Suspension Works', address: '1 Workshop Lane', email: 'desk@demo.test', phone: '+00 111 222' },
    lines: [
      { id: 1, kind: 'spring', end: 'front', springId: 5, sku: 'KF37-0090', operationCode: null, description: 'Fork spring 9.0 N/mm', quantity: 2, minutes: null, unitPriceCents: 5000, lineCents: 10000 },
      { id: 2, kind: 'labour', end: null, springId: null, sku: null, operationCode: 'fork-swap', description: 'Fork spring swap', quantity: 1, minutes: 21, unitPriceCents: 2345, lineCents: 2345 },
    ],
    labourRateCentsPerHour: 6700,
    taxBasisPoints: 2100,
    partsCents: 10000,
    labourCents: 2345,
    subtotalCents: 12345,
    taxCents: 2592,
    totalCents: 14937,
    depositDueCents: 2987,
    paidCents: 0,
    refundedCents: 0,
    balanceDueCents: 14937,
    roundingRule: 'Tax is rounded half up to the cent on the subtotal.',
    cautions: '',
    validUntil: '2026-12-31T00:00:00.000Z',
    fittingAt: null,
    sentAt: '2026-12-01T09:00:00.000Z',
    createdAt: '2026-12-01T08:00:00.000Z',
    updatedAt: '2026-12-01T09:00:00.000Z',
    receipt: null,
    history: [],
    ...overrides,
  };
}

export function quoteSummary(overrides: Partial<QuoteSummary> = {}): QuoteSummary {
  const { id, number, version, status, rider, bikeName, totalCents, currency, validUntil, fittingAt, updatedAt } =
    quoteView();
  return { id, number, version, status, rider, bikeName, totalCents, currency, validUntil, fittingAt, updatedAt, ...overrides };
}
