/** The desk's quote inputs: create from a sizing record, replace the lines of a draft, book, cancel, pay. */
import { array, mixed, number, object, string, type InferType } from 'yup';
import { QUOTE_STATUSES, type QuoteStatus } from '../types/quote';

const id = (label: string) =>
  number().typeError(`${label} must be a number.`).required(`${label} is missing.`).integer(`${label} must be a whole number.`).min(1, `${label} must be a number above 0.`);

const quantity = number()
  .typeError('Quantity must be a whole number.')
  .integer('Quantity must be a whole number.')
  .min(1, 'Quantity is at least 1.')
  .max(20, 'Quantity is at most 20.')
  .default(1);

export const quoteLineInputSchema = object({
  kind: mixed<'spring' | 'labour'>().oneOf(['spring', 'labour'], 'A line is a spring or a labour operation.').required('Say what the line is.'),
  springId: number().when('kind', { is: 'spring', then: () => id('The spring'), otherwise: (s) => s.strip() }),
  end: mixed<'front' | 'rear'>().when('kind', {
    is: 'spring',
    then: (s) => s.oneOf(['front', 'rear'], 'The end is front or rear.').required('Say which end the spring is for.'),
    otherwise: (s) => s.strip(),
  }),
  operationCode: string().when('kind', {
    is: 'labour',
    then: (s) => s.trim().required('Choose an operation from the list.'),
    otherwise: (s) => s.strip(),
  }),
  quantity,
});

export const quoteLinesSchema = object({
  lines: array(quoteLineInputSchema).required('The lines are missing.').max(30, 'At most 30 lines.'),
});

export const quoteCreateSchema = object({
  sizingRecordId: id('The sizing record'),
  /** Without lines, the quote starts from the record's recommendation and the matching operations. */
  lines: array(quoteLineInputSchema).max(30, 'At most 30 lines.').optional().default(undefined),
});

export const quoteBookSchema = object({
  fittingAt: string()
    .required('Give the fitting date and time.')
    .test('date', 'The fitting time must be a date and time (ISO 8601, e.g. 2026-12-03T09:30:00Z).', (v) => !v || !Number.isNaN(Date.parse(v))),
});

export const quoteNoteSchema = object({ reason: string().trim().max(500, 'At most 500 characters.').default('') });

export const payDepositSchema = object({
  paymentMethod: string().trim().required('Choose a card.').max(100, 'That payment method is not valid.'),
});

export const quoteListQuerySchema = object({
  status: mixed<QuoteStatus>().oneOf([...QUOTE_STATUSES], 'Unknown status.').optional(),
  riderId: number().typeError('riderId must be a number.').integer().min(1).optional(),
  q: string().trim().max(100, 'At most 100 characters.').default(''),
  page: number().typeError('page must be a number.').integer().min(1).default(1),
  pageSize: number().typeError('pageSize must be a number.').integer().min(1).max(100).default(25),
});

export const customerCreateSchema = object({
  name: string().trim().required('Give the rider a name.').max(100, 'At most 100 characters.'),
  email: string().trim().lowercase().required('An e-mail is needed for the quote.').email('That is not an e-mail address.'),
});

export type QuoteLineInput = InferType<typeof quoteLineInputSchema>;
export type QuoteCreateInput = InferType<typeof quoteCreateSchema>;
