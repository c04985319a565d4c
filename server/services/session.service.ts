/**
 * Session tokens. A short-lived access token goes in `Authorization: Bearer`; a long-lived refresh
 * token lives in an httpOnly cookie and only buys new access tokens. Both are HS256 JWTs carrying
 * the user's tokenVersion, which is checked against the database on every use, so raising it
 * (sign-out, deactivation, password reset) revokes every token at once.
 */
import { createSecretKey, KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { AppContext } from '../app-context';
import { User } from '../entities/user.entity';

export type TokenKind = 'access' | 'refresh';

export const TOKEN_SECONDS: Record<TokenKind, number> = {
  access: 15 * 60,
  // Long enough that a rider measuring in the garage over a week stays signed in.
  refresh: 14 * 24 * 60 * 60,
};

const ISSUER = 'sagwright';

/** What a token check reads of its user. */
export type SessionUser = Pick<User, 'id' | 'email' | 'name' | 'role' | 'active' | 'tokenVersion'>;

/**
 * Plain SQL on the read connection: the entity query builder cost about twice the read itself, on
 * every signed-in request.
 */
const SESSION_USER_SQL = 'SELECT "id", "email", "name", "role", "active", "tokenVersion" FROM "user" WHERE "id" = ?';

export class SessionService {
  /**
   * The secret as a key object, made once: given the string, jsonwebtoken first tries to read it as
   * a PEM public key on every call, which costs about a millisecond of CPU per request.
   */
  private readonly key: KeyObject;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'secrets'>) {
    this.key = createSecretKey(Buffer.from(ctx.secrets.jwt, 'utf8'));
  }

  private seconds(): number {
    return Math.floor(this.ctx.now().getTime() / 1000);
  }

  issue(user: Pick<User, 'id' | 'tokenVersion'>, kind: TokenKind): string {
    return jwt.sign({ ver: user.tokenVersion, iat: this.seconds() }, this.key, {
      algorithm: 'HS256',
      subject: String(user.id),
      // The audience keeps a refresh token from passing as an access token and back.
      audience: kind,
      issuer: ISSUER,
      expiresIn: TOKEN_SECONDS[kind],
    });
  }

  /** The active user a token stands for, or undefined for any token that is not valid right now. */
  async verify(token: string, kind: TokenKind): Promise<SessionUser | undefined> {
    let claims: jwt.JwtPayload | string;
    try {
      claims = jwt.verify(token, this.key, {
        algorithms: ['HS256'],
        audience: kind,
        issuer: ISSUER,
        clockTimestamp: this.seconds(),
      });
    } catch {
      return undefined;
    }
    // jsonwebtoken checks exp only when present; a token without one would never expire.
    if (typeof claims === 'string' || !Number.isInteger(claims.ver) || typeof claims.exp !== 'number') return undefined;
    const id = Number(claims.sub);
    if (!Number.isInteger(id)) return undefined;
    const [row] = (await this.ctx.db.read.query(SESSION_USER_SQL, [id])) as SessionUser[];
    // SQLite keeps the flag as 0 or 1.
    if (!row || !row.active || row.tokenVersion !== claims.ver) return undefined;
    return { id: row.id, email: row.email, name: row.name, role: row.role, active: true, tokenVersion: row.tokenVersion };
  }
}
