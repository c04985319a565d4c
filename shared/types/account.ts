/** What the auth and user routes answer about an account; never the password hash or token version. */
import { Role } from './roles';

export interface AccountUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** ISO 8601. */
  createdAt: string;
  /** ISO 8601, or null before the first sign-in. */
  lastSignInAt: string | null;
}

/** Answer of sign-up, sign-in and refresh; the refresh token travels separately, in an httpOnly cookie. */
export interface SessionAnswer {
  /** Access token for `Authorization: Bearer`. */
  token: string;
  /** Seconds until the access token expires; refresh a little before. */
  expiresIn: number;
  user: AccountUser;
}

export interface UserPage {
  users: AccountUser[];
  total: number;
  page: number;
  pageSize: number;
}
