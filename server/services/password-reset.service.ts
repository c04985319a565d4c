/**
 * Password reset by mail. The link carries 32 random bytes; only their SHA-256 is stored, and a
 * token works once, within RESET_TOKEN_MINUTES. Using one signs the account out everywhere.
 */
import { createHash, randomBytes } from 'node:crypto';
import { EntityManager, IsNull } from 'typeorm';
import type { AppContext } from '../app-context';
import { PasswordReset } from '../entities/password-reset.entity';
import { User } from '../entities/user.entity';
import { ValidationError } from '../errors';
import { OutgoingMail } from './mailer.service';
import { hashPassword } from './password.service';
import { UsersService } from './users.service';

export const RESET_TOKEN_MINUTES = 30;

function sha256(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

export function resetMail(to: string, name: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Sagwright password',
    text: [
      `Hello ${name},`,
      '',
      `Someone asked to reset the password of your Sagwright account. To choose a new one, open this link within ${RESET_TOKEN_MINUTES} minutes:`,
      '',
      link,
      '',
      'If it was not you, ignore this mail; your password stays as it is.',
    ].join('\n'),
    html: [
      `<p>Hello ${escapeHtml(name)},</p>`,
      `<p>Someone asked to reset the password of your Sagwright account. To choose a new one, open this link within ${RESET_TOKEN_MINUTES} minutes:</p>`,
      `<p><a href="${escapeHtml(link)}">Choose a new password</a></p>`,
      '<p>If it was not you, ignore this mail; your password stays as it is.</p>',
    ].join('\n'),
  };
}

const INVALID_TOKEN = 'This reset link has expired or was already used; ask for a new one.';

export class PasswordResetService {
  constructor(
    private readonly ctx: Pick<AppContext, 'db' | 'now' | 'mailer' | 'log'>,
    private readonly users: UsersService,
  ) {}

  /** Mails a link to an active account with this e-mail; for any other e-mail it does nothing, and says so to no one. */
  async request(email: string, baseUrl: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user || !user.active) return;
    const token = randomBytes(32).toString('base64url');
    const now = this.ctx.now();
    await this.ctx.db.write((manager) =>
      manager.insert(PasswordReset, {
        userId: user.id,
        tokenHash: sha256(token),
        createdAt: now,
        expiresAt: new Date(now.getTime() + RESET_TOKEN_MINUTES * 60_000),
        usedAt: null,
      }),
    );
    const link = `${baseUrl}/reset?token=${encodeURIComponent(token)}`;
    // Not awaited: waiting on SMTP would make a known e-mail answer measurably slower than an unknown one.
    this.ctx.mailer.send(resetMail(user.email, user.name, link)).catch((err) => this.ctx.log('password reset mail not sent', err));
  }

  async reset(token: string, password: string): Promise<void> {
    const tokenHash = sha256(token);
    // Checked before the slow hash so a made-up token costs the server little.
    await this.usable(this.ctx.db.read.manager, tokenHash);
    const passwordHash = await hashPassword(password);
    await this.ctx.db.write(async (manager) => {
      const reset = await this.usable(manager, tokenHash);
      const now = this.ctx.now();
      await manager.update(User, reset.userId, { passwordHash });
      await manager.increment(User, { id: reset.userId }, 'tokenVersion', 1);
      await manager.update(PasswordReset, { userId: reset.userId, usedAt: IsNull() }, { usedAt: now });
    });
  }

  private async usable(manager: EntityManager, tokenHash: string): Promise<PasswordReset> {
    const reset = await manager.findOneBy(PasswordReset, { tokenHash });
    const user = reset && (await manager.findOneBy(User, { id: reset.userId }));
    if (!reset || !user?.active || reset.usedAt || reset.expiresAt.getTime() <= this.ctx.now().getTime()) {
      throw new ValidationError({ token: INVALID_TOKEN }, INVALID_TOKEN);
    }
    return reset;
  }
}
