/** Input of the sign-in, sign-up, password-reset and user-admin forms, checked alike by client and server. */
import { boolean, InferType, mixed, number, object, string } from 'yup';
import { Role, ROLES } from '../types/roles';

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 200;

const email = string()
  .trim()
  .lowercase()
  .max(254, 'An e-mail address has at most 254 characters.')
  .email('Enter an e-mail address like name@example.com.')
  .required('Enter your e-mail address.');

/** A new password; the length limits are the whole policy (no composition rules). */
const newPassword = string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters; a few words in a row are easy to remember.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
  .required('Choose a password.');

const name = string().trim().max(80, 'Keep the name to 80 characters.').required('Enter a name.');

const role = mixed<Role>().oneOf(ROLES, 'Choose one of: rider, desk, counter, admin.').required('Choose a role.');

export const signInSchema = object({
  email,
  // Only bounded here: an old password is never judged against the current rules.
  password: string().max(PASSWORD_MAX, `A password has at most ${PASSWORD_MAX} characters.`).required('Enter your password.'),
});

export const signUpSchema = object({ name, email, password: newPassword });

export const resetRequestSchema = object({ email });

export const resetSchema = object({
  token: string().trim().required('The reset link is incomplete; open it from the e-mail again.'),
  password: newPassword,
});

export const staffCreateSchema = object({ name, email, role, password: newPassword });

export const roleChangeSchema = object({ role });

export const activeChangeSchema = object({
  active: boolean().strict().required('Say whether the account is active.'),
});

export const userSearchSchema = object({
  q: string().trim().max(100).default(''),
  page: number().integer().min(1).default(1),
  pageSize: number().integer().min(1).max(100).default(20),
});

export type SignInInput = InferType<typeof signInSchema>;
export type SignUpInput = InferType<typeof signUpSchema>;
export type ResetRequestInput = InferType<typeof resetRequestSchema>;
export type ResetInput = InferType<typeof resetSchema>;
export type StaffCreateInput = InferType<typeof staffCreateSchema>;
export type RoleChangeInput = InferType<typeof roleChangeSchema>;
export type ActiveChangeInput = InferType<typeof activeChangeSchema>;
export type UserSearchInput = InferType<typeof userSearchSchema>;
