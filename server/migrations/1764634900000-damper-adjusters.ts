import { MigrationInterface, QueryRunner } from 'typeorm';

/** The six kinds of the trade, in the order the form offers them: key, label, circuit, speed. */
const TRADE_KINDS = [
  ['rebound', 'Rebound', 'rebound', 'all'],
  ['compression', 'Compression', 'compression', 'all'],
  ['hs-compression', 'High-speed compression', 'compression', 'high'],
  ['ls-compression', 'Low-speed compression', 'compression', 'low'],
  ['hs-rebound', 'High-speed rebound', 'rebound', 'high'],
  ['ls-rebound', 'Low-speed rebound', 'rebound', 'low'],
] as const;

const OLD_AUDIT_ENTITIES = ['bike-model', 'target-profile', 'engine-setting', 'shop-settings'];

// The stored shapes on either side of this migration, written out here: the types in shared/ move on.
const CLICKER_KINDS = ['rebound', 'compression'] as const;
type ClickerKind = (typeof CLICKER_KINDS)[number];
interface Clicker {
  position: number;
  maxPosition: number;
}
interface StoredDamper {
  kind: string;
  unit: 'clicks' | 'turns';
  maxPosition: number;
  standard: number | null;
  position: number;
  dampingPerStepNsPerM: number | null;
}
type Json = Record<string, unknown>;
type ClicksKinds = Partial<Record<'front' | 'rear', ReadonlySet<string>>>;

const ENDS = ['front', 'rear'] as const;

function parse(text: string | null): Json | null {
  return text === null ? null : (JSON.parse(text) as Json);
}

function write(value: Json | null): string | null {
  return value === null ? null : JSON.stringify(value);
}

/** A bike's or model's end: each clicker becomes an adjuster counted in clicks, with no standard and no dyno figure. */
function endUp(end: Json | null): Json | null {
  if (!end) return end;
  const { clickers, ...rest } = end as Json & { clickers?: Partial<Record<ClickerKind, Clicker | null>> };
  const dampers: StoredDamper[] = CLICKER_KINDS.flatMap((kind) => {
    const clicker = clickers?.[kind];
    return clicker ? [{ kind, unit: 'clicks' as const, maxPosition: clicker.maxPosition, standard: null, position: clicker.position, dampingPerStepNsPerM: null }] : [];
  });
  return { ...rest, dampers };
}

/** Back to clickers: only a rebound or compression adjuster counted in clicks has one; the rest are dropped. */
function endDown(end: Json | null): Json | null {
  if (!end) return end;
  const { dampers, ...rest } = end as Json & { dampers?: StoredDamper[] };
  const clicker = (kind: ClickerKind): Clicker | null => {
    const damper = (dampers ?? []).find((d) => d.kind === kind && d.unit === 'clicks');
    return damper ? { position: damper.position, maxPosition: damper.maxPosition } : null;
  };
  return { ...rest, clickers: { rebound: clicker('rebound'), compression: clicker('compression') } };
}

/** A setup-log entry's settings: rebound and compression positions become the adjusters by kind. */
function settingsUp(settings: Json): Json {
  const next: Json = { ...settings };
  for (const end of ENDS) {
    const at = settings[end] as (Json & Partial<Record<ClickerKind, number | null>>) | null | undefined;
    if (!at) continue;
    const { rebound, compression, ...rest } = at;
    const dampers: Record<string, number> = {};
    if (rebound !== null && rebound !== undefined) dampers.rebound = rebound;
    if (compression !== null && compression !== undefined) dampers.compression = compression;
    next[end] = { ...rest, dampers };
  }
  return next;
}

/**
 * The log holds positions without units: a rebound or compression setting is kept where the bike's
 * adjuster of that kind counts clicks, and dropped otherwise (turns, or an adjuster gone from the bike).
 */
function settingsDown(settings: Json, clicks: ClicksKinds): Json {
  const next: Json = { ...settings };
  for (const end of ENDS) {
    const at = settings[end] as (Json & { dampers?: Record<string, number> }) | null | undefined;
    if (!at) continue;
    const { dampers, ...rest } = at;
    const kept = (kind: ClickerKind) => (clicks[end]?.has(kind) ? (dampers?.[kind] ?? null) : null);
    next[end] = { ...rest, rebound: kept('rebound'), compression: kept('compression') };
  }
  return next;
}

function clicksKindsOf(front: Json | null, rear: Json | null): ClicksKinds {
  const of = (end: Json | null) => new Set(((end?.dampers as StoredDamper[] | undefined) ?? []).filter((d) => d.unit === 'clicks').map((d) => d.kind));
  return { front: of(front), rear: of(rear) };
}

async function convertEnds(q: QueryRunner, table: 'bike' | 'bike_model', convert: (end: Json | null) => Json | null): Promise<void> {
  const rows: { id: number; front: string | null; rear: string | null }[] = await q.query(`SELECT "id", "front", "rear" FROM "${table}" ORDER BY "id"`);
  for (const row of rows) {
    await q.query(`UPDATE "${table}" SET "front" = ?, "rear" = ? WHERE "id" = ?`, [write(convert(parse(row.front))), write(convert(parse(row.rear))), row.id]);
  }
}

/** The audit_entry table with the entities its CHECK allows; SQLite changes a CHECK only by rebuilding the table. */
async function rebuildAudit(q: QueryRunner, entities: readonly string[], keep: string): Promise<void> {
  const columns = `"id", "at", "actorId", "actorName", "entity", "entityKey", "action", "before", "after"`;
  await q.query(`CREATE TABLE "audit_entry_rebuilt" (
      "id" INTEGER PRIMARY KEY AUTOINCREMENT NOT NULL,
      "at" DATETIME NOT NULL,
      "actorId" INTEGER REFERENCES "user" ("id") ON DELETE SET NULL,
      "actorName" TEXT NOT NULL,
      "entity" TEXT NOT NULL CHECK ("entity" IN (${entities.map((e) => `'${e}'`).join(', ')})),
      "entityKey" TEXT NOT NULL,
      "action" TEXT NOT NULL CHECK ("action" IN ('create', 'update', 'delete')),
      "before" TEXT CHECK ("before" IS NULL OR json_valid("before")),
      "after" TEXT CHECK ("after" IS NULL OR json_valid("after"))
    )`);
  await q.query(`INSERT INTO "audit_entry_rebuilt" (${columns}) SELECT ${columns} FROM "audit_entry" WHERE ${keep} ORDER BY "id"`);
  await q.query(`DROP TABLE "audit_entry"`);
  await q.query(`ALTER TABLE "audit_entry_rebuilt" RENAME TO "audit_entry"`);
  await q.query(`CREATE INDEX "idx_audit_entry_entity" ON "audit_entry" ("entity", "id")`);
}

/**
 * Damping adjusters as a list per end. Creates the shop's list of adjuster kinds with the six of
 * the trade, lets the audit record additions to it (audit_entry rebuilt with the wider CHECK, rows
 * and ids kept; nothing references it), and turns every stored `clickers` of bikes and bike models
 * into `dampers`, and every setup-log entry's rebound and compression positions into `dampers` by
 * kind. Sizing records, drafts and seed records hold no clickers (a stored sizing request never
 * carries them). Audit rows keep the bike models as they were written: they record the past.
 */
export class DamperAdjusters1764634900000 implements MigrationInterface {
  name = 'DamperAdjusters1764634900000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE "damper_kind" (
      "key" TEXT PRIMARY KEY NOT NULL CHECK (length("key") <= 40 AND "key" GLOB '[a-z]*' AND "key" NOT GLOB '*[^a-z0-9-]*'),
      "label" TEXT NOT NULL CHECK (length(trim("label")) BETWEEN 1 AND 60),
      "circuit" TEXT NOT NULL CHECK ("circuit" IN ('rebound', 'compression')),
      "speed" TEXT NOT NULL CHECK ("speed" IN ('all', 'high', 'low')),
      "createdAt" DATETIME NOT NULL
    )`);
    for (const [key, label, circuit, speed] of TRADE_KINDS) {
      await q.query(`INSERT INTO "damper_kind" ("key", "label", "circuit", "speed", "createdAt") VALUES (?, ?, ?, ?, strftime('%Y-%m-%d %H:%M:%f', 'now'))`, [key, label, circuit, speed]);
    }
    await rebuildAudit(q, [...OLD_AUDIT_ENTITIES, 'damper-kind'], 'TRUE');
    await convertEnds(q, 'bike_model', endUp);
    await convertEnds(q, 'bike', endUp);
    const entries: { id: number; before: string; after: string }[] = await q.query(`SELECT "id", "before", "after" FROM "setup_log_entry" ORDER BY "id"`);
    for (const entry of entries) {
      await q.query(`UPDATE "setup_log_entry" SET "before" = ?, "after" = ? WHERE "id" = ?`, [
        JSON.stringify(settingsUp(JSON.parse(entry.before) as Json)),
        JSON.stringify(settingsUp(JSON.parse(entry.after) as Json)),
        entry.id,
      ]);
    }
  }

  /**
   * Back to clickers. Lossy: adjusters of other kinds than rebound and compression, adjusters counted
   * in turns, makers' standards and dyno figures are dropped, and so are the kinds the shop added and
   * their audit rows. The log is converted first, while the bikes still say which adjusters count clicks.
   */
  async down(q: QueryRunner): Promise<void> {
    const entries: { id: number; before: string; after: string; front: string | null; rear: string | null }[] = await q.query(
      `SELECT e."id", e."before", e."after", b."front", b."rear" FROM "setup_log_entry" e JOIN "bike" b ON b."id" = e."bikeId" ORDER BY e."id"`,
    );
    for (const entry of entries) {
      const clicks = clicksKindsOf(parse(entry.front), parse(entry.rear));
      await q.query(`UPDATE "setup_log_entry" SET "before" = ?, "after" = ? WHERE "id" = ?`, [
        JSON.stringify(settingsDown(JSON.parse(entry.before) as Json, clicks)),
        JSON.stringify(settingsDown(JSON.parse(entry.after) as Json, clicks)),
        entry.id,
      ]);
    }
    await convertEnds(q, 'bike', endDown);
    await convertEnds(q, 'bike_model', endDown);
    await rebuildAudit(q, OLD_AUDIT_ENTITIES, `"entity" <> 'damper-kind'`);
    await q.query(`DROP TABLE "damper_kind"`);
  }
}
