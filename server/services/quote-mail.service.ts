/** Sends a quote to its rider: HTML and plain text, with the customer link that opens it. */
import type { QuoteView } from '../../shared/types/quote';
import type { AppContext } from '../app-context';
import type { AuthUser } from '../types/auth-user';
import { formatCents } from '../../shared/money/format-cents';
import { OutgoingMail } from './mailer.service';
import { QuotesService } from './quotes.service';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

export function quoteLink(baseUrl: string, token: string): string {
  return `${baseUrl.replace(/\/+$/, '')}/q/${token}`;
}

export function composeQuoteMail(quote: QuoteView, link: string): OutgoingMail {
  const money = (cents: number) => formatCents(cents, quote.currency);
  const validUntil = quote.validUntil.slice(0, 10);
  const rows = quote.lines.map((l) => ({ text: `${l.description}${l.quantity > 1 ? ` x ${l.quantity}` : ''}`, amount: money(l.lineCents) }));
  const totals = [
    ['Subtotal', money(quote.subtotalCents)],
    [`Tax (${quote.taxBasisPoints / 100} %)`, money(quote.taxCents)],
    ['Total', money(quote.totalCents)],
    ['Deposit due on acceptance', money(quote.depositDueCents)],
  ];
  const subject = `Your spring-swap quote ${quote.number} from ${quote.shop.name}`;
  const text = [
    `Hello ${quote.rider.name},`,
    '',
    `Here is quote ${quote.number} (version ${quote.version}) for ${quote.bikeName ?? 'your bike'}, valid until ${validUntil}.`,
    '',
    ...rows.map((r) => `${r.text}: ${r.amount}`),
    '',
    ...totals.map(([label, value]) => `${label}: ${value}`),
    '',
    `View, accept or decline it here: ${link}`,
    '',
    quote.cautions,
    '',
    `${quote.shop.name}, ${quote.shop.address}, ${quote.shop.phone}, ${quote.shop.email}`,
  ].join('\n');
  const html = `<!doctype html><html><body style="font-family:sans-serif">
<p>Hello ${escapeHtml(quote.rider.name)},</p>
<p>Here is quote <strong>${escapeHtml(quote.number)}</strong> (version ${quote.version}) for ${escapeHtml(quote.bikeName ?? 'your bike')}, valid until ${validUntil}.</p>
<table cellpadding="4">
${rows.map((r) => `<tr><td>${escapeHtml(r.text)}</td><td align="right">${r.amount}</td></tr>`).join('\n')}
${totals.map(([label, value]) => `<tr><th align="left">${escapeHtml(label)}</th><td align="right">${value}</td></tr>`).join('\n')}
</table>
<p><a href="${escapeHtml(link)}">View, accept or decline the quote</a></p>
<p>${escapeHtml(quote.cautions)}</p>
<p>${escapeHtml(quote.shop.name)}, ${escapeHtml(quote.shop.address)}, ${escapeHtml(quote.shop.phone)}, ${escapeHtml(quote.shop.email)}</p>
</body></html>`;
  return { to: quote.rider.email, subject, text, html };
}

export class QuoteMailService {
  constructor(
    private readonly ctx: Pick<AppContext, 'db' | 'now' | 'mailer' | 'sizingData' | 'payments' | 'log'>,
    private readonly quotes: QuotesService,
  ) {}

  /** Marks the quote sent with a fresh link, then mails it; a mail that fails leaves it sent, to be sent again. */
  async send(user: AuthUser, id: number, baseUrl: string): Promise<{ quote: QuoteView; mailed: boolean }> {
    const { token } = await this.quotes.markSent(user, id);
    const quote = await this.quotes.get(user, id);
    try {
      await this.ctx.mailer.send(composeQuoteMail(quote, quoteLink(baseUrl, token)));
      return { quote, mailed: true };
    } catch (err) {
      this.ctx.log('quote mail not sent', err);
      return { quote, mailed: false };
    }
  }
}
