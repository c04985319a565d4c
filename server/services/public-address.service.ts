/**
 * The shop's public address: what links in mails are built on and which origin the cookie routes
 * trust. Never taken from a request: anyone can send any Host or Origin, and a reset link built on
 * them goes to whoever sent it. In order: SAGWRIGHT_PUBLIC_URL, the admin's shop setting, and,
 * outside production only, the address the server listens on.
 */
import type { Database } from '../data-source';
import type { ServerConfig } from '../env';
import { ConflictError } from '../errors';
import { loadPublicUrlSetting } from './shop-settings.service';

interface Address {
  /** What links start with; SAGWRIGHT_PUBLIC_URL may carry a path. */
  base: string;
  /** As a browser's Origin header names it. */
  origin: string;
}

const localAddress = (port: number): Address => ({ base: `http://localhost:${port}`, origin: `http://localhost:${port}` });

export class PublicAddress {
  private readonly configured: Address | undefined;
  /** Until the server listens, the port it was asked for (0 asks for any free one: unknown until then). */
  private listening: Address | undefined;

  constructor(
    private readonly config: Pick<ServerConfig, 'publicUrl' | 'production' | 'port'>,
    private readonly db: Database,
  ) {
    this.configured = config.publicUrl ? { base: config.publicUrl, origin: new URL(config.publicUrl).origin } : undefined;
    this.listening = config.port ? localAddress(config.port) : undefined;
  }

  /** Called by server/index.ts with the port it listens on. */
  listeningOn(port: number): void {
    this.listening = localAddress(port);
  }

  /**
   * Undefined in production when neither the environment nor the admin names it: the machine's own
   * address would mean nothing to a rider reading the mail elsewhere.
   */
  async current(): Promise<Address | undefined> {
    if (this.configured) return this.configured;
    // Stored as an origin: the shared schema normalises it.
    const setting = await loadPublicUrlSetting(this.db.read.manager);
    if (setting) return { base: setting, origin: setting };
    return this.config.production ? undefined : this.listening;
  }

  /** The base of a link to mail; a 409 while the address is unknown, so no link is sent to a guessed host. */
  async forLinks(): Promise<string> {
    const address = await this.current();
    if (!address) {
      throw new ConflictError(
        "Mails with links cannot be sent until the shop's public web address is set: an admin sets it under shop settings (or SAGWRIGHT_PUBLIC_URL).",
        'no-public-address',
      );
    }
    return address.base;
  }
}
