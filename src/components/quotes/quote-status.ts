/** How each quote status reads, and the tint of its badge. */
import type { CardTone } from '@/components/ui/card';
import type { QuoteStatus } from '@shared/types/quote';

export const STATUS_LABELS: Record<QuoteStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  accepted: 'Accepted',
  declined: 'Declined',
  'deposit-paid': 'Deposit paid',
  booked: 'Booked',
  'springs-released': 'Springs released',
  fitted: 'Fitted',
  cancelled: 'Cancelled',
  expired: 'Expired',
  superseded: 'Superseded',
};

export const STATUS_TONES: Record<QuoteStatus, CardTone> = {
  draft: 'plain',
  sent: 'warning',
  accepted: 'success',
  declined: 'danger',
  'deposit-paid': 'success',
  booked: 'success',
  'springs-released': 'warning',
  fitted: 'plain',
  cancelled: 'danger',
  expired: 'plain',
  superseded: 'plain',
};

/** Day and time in the viewer's own locale and zone, e.g. a fitting slot. */
export function formatDateTime(iso: string): string {
  return new Date(iso).toLocaleString(undefined, {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
  });
}

export function formatDate(iso: string): string {
  return new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}
