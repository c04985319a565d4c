/** The admin's shop settings (PUT /api/shop-settings): labour, tax, deposit, operations, validity for quotes; the public address. */
import { array, mixed, number, object, string, type InferType } from 'yup';

const wholeCents = (label: string, max: number) =>
  number()
    .typeError(`${label} must be a whole number of cents.`)
    .required(`${label} is missing.`)
    .integer(`${label} must be a whole number of cents.`)
    .min(0, `${label} cannot be negative.`)
    .max(max, `${label} must be at most ${max} cents.`);

export const MAX_LABOUR_RATE_CENTS = 100_000;
export const MAX_FIXED_DEPOSIT_CENTS = 10_000_000;

export const labourOperationSchema = object({
  code: string()
    .trim()
    .required('Give the operation a short code.')
    .matches(/^[a-z0-9][a-z0-9-]{0,39}$/, 'Codes are lower-case letters, digits and dashes, up to 40.'),
  label: string().trim().required('Name the operation.').max(80, 'At most 80 characters.'),
  minutes: number()
    .typeError('Standard time must be whole minutes.')
    .required('Standard time is missing.')
    .integer('Standard time must be whole minutes.')
    .min(1, 'Standard time is at least 1 minute.')
    .max(24 * 60, 'Standard time is at most 1440 minutes.'),
});

export const depositRuleSchema = object({
  kind: mixed<'percent' | 'fixed'>().oneOf(['percent', 'fixed'], 'The deposit is a percentage or a fixed sum.').required('Choose how the deposit is worked out.'),
  basisPoints: number().when('kind', {
    is: 'percent',
    then: (s) =>
      s
        .typeError('The percentage is in basis points (2500 = 25 %), a whole number.')
        .required('The percentage is missing.')
        .integer('The percentage is in whole basis points.')
        .min(0, 'The percentage cannot be negative.')
        .max(10_000, 'The deposit is at most 100 % (10000).'),
    otherwise: (s) => s.strip(),
  }),
  cents: number().when('kind', {
    is: 'fixed',
    then: () => wholeCents('The fixed deposit', MAX_FIXED_DEPOSIT_CENTS),
    otherwise: (s) => s.strip(),
  }),
});

const MAX_PUBLIC_URL_LENGTH = 200;

/**
 * What is wrong with a public address, or undefined when it is one: http(s), a host and maybe a
 * port, nothing after them but one optional `/`. Checked by hand rather than with URL, which
 * accepts and rewrites far more (and differs between the browser and the server).
 */
function publicUrlProblem(value: string): string | undefined {
  const scheme = /^https?:\/\//i.exec(value);
  if (!scheme) return 'Start the address with http:// or https://, like https://shop.example.';
  const rest = value.slice(scheme[0].length);
  const authority = /^[^/?#]*/.exec(rest)![0];
  if (rest.length > authority.length && rest !== `${authority}/`) return 'Give only the address: no path, ? or # after the host and port.';
  if (authority.includes('@')) return 'Leave out a user name and password.';
  const hostAndPort = /^([a-z0-9](?:[a-z0-9-]*[a-z0-9])?(?:\.[a-z0-9](?:[a-z0-9-]*[a-z0-9])?)*|\[[0-9a-f:.]+\])(?::(\d*))?$/i.exec(authority);
  if (!hostAndPort) return 'This is not a web address: type it as the browser shows it, like https://shop.example or http://192.168.1.20:8080.';
  const port = hostAndPort[2];
  if (port !== undefined && !(/^\d{1,5}$/.test(port) && Number(port) >= 1 && Number(port) <= 65535)) return 'The port is a whole number from 1 to 65535.';
  return undefined;
}

/** The address as a browser writes an origin (RFC 6454 §6.2): lower case, no default port, no trailing `/`. */
function normalisePublicUrl(value: string): string {
  return value
    .toLowerCase()
    .replace(/\/$/, '')
    .replace(/^(http:\/\/[^/]+):80$|^(https:\/\/[^/]+):443$/, '$1$2');
}

export const shopSettingsSchema = object({
  labourRateCentsPerHour: wholeCents('The labour rate', MAX_LABOUR_RATE_CENTS).min(1, 'The labour rate must be above 0.'),
  taxBasisPoints: number()
    .typeError('The tax rate is in basis points (2000 = 20 %), a whole number.')
    .required('The tax rate is missing.')
    .integer('The tax rate is in whole basis points.')
    .min(0, 'The tax rate cannot be negative.')
    .max(5_000, 'The tax rate is at most 50 % (5000).'),
  deposit: depositRuleSchema.required('The deposit rule is missing.'),
  operations: array(labourOperationSchema)
    .required('The operation list is missing.')
    .min(1, 'List at least one operation.')
    .max(50, 'At most 50 operations.')
    .test('unique-codes', 'Each operation needs its own code.', (ops) => !ops || new Set(ops.map((o) => o.code)).size === ops.length),
  quoteValidityDays: number()
    .typeError('Validity is whole days.')
    .required('Validity is missing.')
    .integer('Validity is whole days.')
    .min(1, 'A quote is valid for at least 1 day.')
    .max(365, 'A quote is valid for at most 365 days.'),
  cautions: string().trim().max(4000, 'At most 4000 characters.').default(''),
  /** Empty or null: not set. */
  publicUrl: string()
    .trim()
    .nullable()
    .transform((value: unknown) => (typeof value === 'string' && value ? normalisePublicUrl(value) : value))
    .max(MAX_PUBLIC_URL_LENGTH, `At most ${MAX_PUBLIC_URL_LENGTH} characters.`)
    .test('public-url', (value, context) => {
      const problem = value ? publicUrlProblem(value) : undefined;
      return problem ? context.createError({ message: problem }) : true;
    }),
});

export type ShopSettingsInput = InferType<typeof shopSettingsSchema>;
