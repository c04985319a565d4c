/** What the admin's shop data editors read: the engine's settings and the audit of every edit. */

import type { AuditEntity } from '../schemas/shop-data.schema';

/** One row of GET /api/engine-settings. */
export interface EngineSettingRow {
  key: string;
  value: number;
  unit: string;
  label: string;
  source: string;
}

export type AuditAction = 'create' | 'update' | 'delete';

export interface AuditEntry {
  id: number;
  /** ISO 8601. */
  at: string;
  actorId: number | null;
  /** As the account was named at the time. */
  actorName: string;
  entity: AuditEntity;
  /** The bike model's id, the profile's discipline, or the setting's key. */
  entityKey: string;
  action: AuditAction;
  /** The stored row before and after; null before a create and after a delete. */
  before: unknown;
  after: unknown;
}

export interface AuditPage {
  entries: AuditEntry[];
  total: number;
  page: number;
  pageSize: number;
}
