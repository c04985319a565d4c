/** The service desk's quotes as the API answers them. Every amount is integer cents of `currency`. */
import type { EndKind } from './sizing';

/**
 * `springs-released`: the parts counter took back a spring the quote held (an audited override);
 * the quote can no longer be fitted and is cancelled, with its deposit refunded.
 */
export const QUOTE_STATUSES = ['draft', 'sent', 'accepted', 'declined', 'deposit-paid', 'booked', 'springs-released', 'fitted', 'cancelled', 'expired', 'superseded'] as const;

export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

export interface LabourOperation {
  code: string;
  label: string;
  minutes: number;
}

export interface ShopSettingsView {
  labourRateCentsPerHour: number;
  taxBasisPoints: number;
  deposit: { kind: 'percent'; basisPoints: number } | { kind: 'fixed'; cents: number };
  operations: LabourOperation[];
  quoteValidityDays: number;
  cautions: string;
  /** Where riders reach the web app, for links in mails; null: SAGWRIGHT_PUBLIC_URL or the address the server listens on. */
  publicUrl: string | null;
  updatedAt: string;
}

export interface QuoteLineView {
  id: number;
  kind: 'spring' | 'labour';
  end: EndKind | null;
  springId: number | null;
  sku: string | null;
  operationCode: string | null;
  description: string;
  quantity: number;
  minutes: number | null;
  unitPriceCents: number;
  lineCents: number;
}

export interface QuoteStatusEventView {
  from: QuoteStatus | null;
  to: QuoteStatus;
  at: string;
  actor: { kind: 'staff' | 'rider' | 'customer-link' | 'system' | 'payment'; id: number | null; name: string };
  note: string;
}

export interface ReceiptView {
  amountCents: number;
  paidAt: string;
  method: string;
  last4: string | null;
  intentId: string;
}

export interface ShopIdentity {
  name: string;
  address: string;
  email: string;
  phone: string;
}

export interface QuoteView {
  id: number;
  number: string;
  version: number;
  previousId: number | null;
  supersededById: number | null;
  status: QuoteStatus;
  rider: { id: number; name: string; email: string };
  bikeId: number | null;
  bikeName: string | null;
  sizingRecordId: number;
  currency: string;
  shop: ShopIdentity;
  lines: QuoteLineView[];
  labourRateCentsPerHour: number;
  taxBasisPoints: number;
  partsCents: number;
  labourCents: number;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  depositDueCents: number;
  paidCents: number;
  refundedCents: number;
  /** What is left to pay at fitting: total less what was paid and not refunded. */
  balanceDueCents: number;
  roundingRule: string;
  cautions: string;
  validUntil: string;
  fittingAt: string | null;
  sentAt: string | null;
  createdAt: string;
  updatedAt: string;
  receipt: ReceiptView | null;
  history: QuoteStatusEventView[];
}

export interface QuoteSummary {
  id: number;
  number: string;
  version: number;
  status: QuoteStatus;
  rider: { id: number; name: string; email: string };
  bikeName: string | null;
  totalCents: number;
  currency: string;
  validUntil: string;
  fittingAt: string | null;
  updatedAt: string;
}

export interface QuotePage {
  quotes: QuoteSummary[];
  total: number;
  page: number;
  pageSize: number;
}

export interface SpringOption {
  springId: number;
  sku: string;
  family: string;
  rateNmm: number;
  priceCents: number | null;
  available: number;
  recommended: boolean;
}

export interface CustomerSummary {
  id: number;
  name: string;
  email: string;
  bikes: number;
  createdAt: string;
}
