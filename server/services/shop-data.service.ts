/**
 * The admin's edits of what every sizing reads: target profiles and the engine's settings. Each
 * write is audited and drops the sizing cache inside its transaction, and again once committed,
 * since a sizing between the two could have cached the rows as they were.
 */
import { checkEngineSettings } from '../../shared/schemas/shop-data.schema';
import type { EngineSettingRow } from '../../shared/types/shop-data';
import type { EndWindowsPct, TargetProfile as ProfileView } from '../../shared/types/sizing';
import type { AppContext } from '../app-context';
import { EngineSetting } from '../entities/engine-setting.entity';
import { TargetProfile } from '../entities/target-profile.entity';
import { NotFoundError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { recordAudit } from './audit.service';
import { toProfile, toProfileRow } from './sizing-data.service';

export interface ProfileInput {
  label: string;
  note: string;
  front: EndWindowsPct;
  rear: EndWindowsPct;
}

function toSettingRow(row: EngineSetting): EngineSettingRow {
  return { key: row.key, value: row.value, unit: row.unit, label: row.label, source: row.source };
}

export class ShopDataService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'sizingData'>) {}

  async updateProfile(actor: AuthUser, discipline: string, input: ProfileInput): Promise<ProfileView> {
    const after = await this.ctx.db.write(async (manager) => {
      const row = await manager.findOneBy(TargetProfile, { discipline });
      if (!row) throw new NotFoundError('There is no such target profile.');
      const saved = await manager.save(TargetProfile, { ...row, ...toProfileRow(input) });
      const view = toProfile(saved);
      await recordAudit(manager, actor, this.ctx.now(), { entity: 'target-profile', entityKey: discipline, action: 'update', before: toProfile(row), after: view });
      this.ctx.sizingData.invalidate();
      return view;
    });
    this.ctx.sizingData.invalidate();
    return after;
  }

  async settings(): Promise<EngineSettingRow[]> {
    const rows = await this.ctx.db.read.getRepository(EngineSetting).find({ order: { key: 'ASC' } });
    return rows.map(toSettingRow);
  }

  /** Changes the values given, each checked against its key's range; one audit row per value that changed. */
  async updateSettings(actor: AuthUser, values: unknown): Promise<EngineSettingRow[]> {
    const rows = await this.ctx.db.write(async (manager) => {
      const stored = await manager.find(EngineSetting, { order: { key: 'ASC' } });
      const checked = checkEngineSettings(values, stored);
      if (!checked.ok) throw new ValidationError(checked.fields);
      const now = this.ctx.now();
      for (const row of stored) {
        const value = checked.values[row.key];
        if (value === undefined || value === row.value) continue;
        await manager.update(EngineSetting, { key: row.key }, { value });
        await recordAudit(manager, actor, now, {
          entity: 'engine-setting',
          entityKey: row.key,
          action: 'update',
          before: toSettingRow(row),
          after: toSettingRow({ ...row, value }),
        });
        row.value = value;
      }
      this.ctx.sizingData.invalidate();
      return stored;
    });
    this.ctx.sizingData.invalidate();
    return rows.map(toSettingRow);
  }
}
