/**
 * The money of a quote, in integer cents. The rule (QUOTE_ROUNDING_RULE) is the one the server
 * applies and the quote page states:
 * - a part line is quantity x unit price, exact;
 * - a labour line is round-half-up(minutes x rate per hour / 60), per line;
 * - tax is round-half-to-even(subtotal x rate in basis points / 10000), once on the subtotal;
 * - the total is subtotal + tax (prices are quoted before tax);
 * - a percentage deposit is round-half-up(total x basis points / 10000); a fixed one is its sum;
 *   either is at most the total.
 */
import { divideRoundHalfEven, divideRoundHalfUp } from './rounding';

export const QUOTE_ROUNDING_RULE =
  'Parts: quantity x unit price. Labour: minutes x hourly rate / 60, rounded half up to the cent, per line. ' +
  'Tax: subtotal x tax rate, rounded half to even, once. Deposit: a percentage of the total rounded half up, or a fixed sum, at most the total.';

export const BASIS_POINTS = 10_000;

export type DepositRule = { kind: 'percent'; basisPoints: number } | { kind: 'fixed'; cents: number };

export interface PartLineInput {
  kind: 'spring';
  quantity: number;
  unitPriceCents: number;
}

export interface LabourLineInput {
  kind: 'labour';
  /** How many times the operation is done (usually 1). */
  quantity: number;
  minutes: number;
  rateCentsPerHour: number;
}

export type TotalLineInput = PartLineInput | LabourLineInput;

export interface QuoteTotals {
  lineCents: number[];
  partsCents: number;
  labourCents: number;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
}

export function labourCents(minutes: number, rateCentsPerHour: number): number {
  return divideRoundHalfUp(minutes * rateCentsPerHour, 60);
}

export function lineCents(line: TotalLineInput): number {
  return line.kind === 'spring' ? line.quantity * line.unitPriceCents : labourCents(line.quantity * line.minutes, line.rateCentsPerHour);
}

export function taxCents(subtotalCents: number, taxBasisPoints: number): number {
  return divideRoundHalfEven(subtotalCents * taxBasisPoints, BASIS_POINTS);
}

export function computeQuoteTotals(lines: readonly TotalLineInput[], taxBasisPoints: number): QuoteTotals {
  const amounts = lines.map(lineCents);
  const partsCents = lines.reduce((sum, line, i) => (line.kind === 'spring' ? sum + amounts[i] : sum), 0);
  const labour = lines.reduce((sum, line, i) => (line.kind === 'labour' ? sum + amounts[i] : sum), 0);
  const subtotalCents = partsCents + labour;
  const tax = taxCents(subtotalCents, taxBasisPoints);
  return { lineCents: amounts, partsCents, labourCents: labour, subtotalCents, taxCents: tax, totalCents: subtotalCents + tax };
}

export function depositCents(totalCents: number, rule: DepositRule): number {
  const due = rule.kind === 'percent' ? divideRoundHalfUp(totalCents * rule.basisPoints, BASIS_POINTS) : rule.cents;
  return Math.min(due, totalCents);
}
