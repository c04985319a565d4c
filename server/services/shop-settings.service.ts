/** The shop's terms for quotes and its public address: one row, read by every quote built, edited by the admin. */
import { isDeepStrictEqual } from 'node:util';
import { EntityManager } from 'typeorm';
import type { ShopSettingsInput } from '../../shared/schemas/shop-settings.schema';
import type { ShopIdentity, ShopSettingsView } from '../../shared/types/quote';
import type { AppContext } from '../app-context';
import { Shop } from '../entities/shop.entity';
import { ShopSettings } from '../entities/shop-settings.entity';
import { ConflictError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { recordAudit } from './audit.service';

const SETTINGS_ID = 1;
/** The audit's key for the one row of terms. */
export const SHOP_SETTINGS_AUDIT_KEY = 'quote-terms';

export function toShopSettingsView(row: ShopSettings): ShopSettingsView {
  return {
    labourRateCentsPerHour: row.labourRateCentsPerHour,
    taxBasisPoints: row.taxBasisPoints,
    deposit: row.deposit,
    operations: row.operations,
    quoteValidityDays: row.quoteValidityDays,
    cautions: row.cautions,
    publicUrl: row.publicUrl,
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The settings a quote is built with; a shop that has none set cannot quote yet. */
export async function loadShopSettings(manager: EntityManager): Promise<ShopSettings> {
  const row = await manager.findOneBy(ShopSettings, { id: SETTINGS_ID });
  if (!row) throw new ConflictError('The shop has no labour rate, tax rate or deposit rule yet: an admin sets them under shop settings.', 'no-shop-settings');
  return row;
}

/** The public address the admin set, or null; SAGWRIGHT_PUBLIC_URL wins over it (public-address.service.ts). */
export async function loadPublicUrlSetting(manager: EntityManager): Promise<string | null> {
  const row = await manager.findOne(ShopSettings, { select: { id: true, publicUrl: true }, where: { id: SETTINGS_ID } });
  return row?.publicUrl ?? null;
}

export async function loadShop(manager: EntityManager): Promise<{ identity: ShopIdentity; currency: string }> {
  const shop = await manager.findOne(Shop, { where: {}, order: { id: 'ASC' } });
  if (!shop) throw new ConflictError("The shop's name and currency are not set up yet.", 'no-shop');
  return { identity: { name: shop.name, address: shop.address, email: shop.email, phone: shop.phone }, currency: shop.currency };
}

/** The terms as the audit keeps them: the view without the edit's own time. */
function termsOf(row: ShopSettings): Omit<ShopSettingsView, 'updatedAt'> {
  const { updatedAt: _updatedAt, ...terms } = toShopSettingsView(row);
  return terms;
}

function settingsRow(manager: EntityManager, input: ShopSettingsInput, updatedById: number | null, now: Date): ShopSettings {
  const deposit = input.deposit.kind === 'percent' ? { kind: 'percent' as const, basisPoints: input.deposit.basisPoints! } : { kind: 'fixed' as const, cents: input.deposit.cents! };
  return manager.create(ShopSettings, {
    id: SETTINGS_ID,
    labourRateCentsPerHour: input.labourRateCentsPerHour,
    taxBasisPoints: input.taxBasisPoints,
    deposit,
    operations: input.operations.map((o) => ({ code: o.code, label: o.label, minutes: o.minutes })),
    quoteValidityDays: input.quoteValidityDays,
    cautions: input.cautions,
    publicUrl: input.publicUrl || null,
    updatedById,
    updatedAt: now,
  });
}

export async function writeShopSettings(manager: EntityManager, input: ShopSettingsInput, updatedById: number | null, now: Date): Promise<ShopSettings> {
  return manager.save(settingsRow(manager, input, updatedById, now));
}

export class ShopSettingsService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {}

  async get(): Promise<ShopSettingsView> {
    return toShopSettingsView(await loadShopSettings(this.ctx.db.read.manager));
  }

  /**
   * Quotes already made keep the rates they were made with. The change is audited in the same
   * transaction, before and after as the terms read; a put that changes nothing writes nothing.
   */
  async put(user: AuthUser, input: ShopSettingsInput): Promise<ShopSettingsView> {
    const row = await this.ctx.db.write(async (manager) => {
      const stored = await manager.findOneBy(ShopSettings, { id: SETTINGS_ID });
      const now = this.ctx.now();
      const next = settingsRow(manager, input, user.id, now);
      const before = stored ? termsOf(stored) : null;
      const after = termsOf(next);
      if (stored && isDeepStrictEqual(before, after)) return stored;
      const saved = await manager.save(next);
      await recordAudit(manager, user, now, { entity: 'shop-settings', entityKey: SHOP_SETTINGS_AUDIT_KEY, action: stored ? 'update' : 'create', before, after });
      return saved;
    });
    return toShopSettingsView(row);
  }
}
