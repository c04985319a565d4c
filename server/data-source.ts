/**
 * The SQLite file behind Sagwright. Writes use one connection behind a queue; reads use a
 * second, read-only connection, which under WAL sees only committed data and never waits
 * for a writer.
 */
import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { DataSource, DataSourceOptions, EntityManager } from 'typeorm';
import { beginTransactionsImmediately } from './db/immediate-transactions';
import { gateReads } from './db/read-gate';
import { WriteQueue } from './db/write-queue';
import { entities } from './entities';
import { readConfig } from './env';
import { migrations } from './migrations';

export const DATABASE_FILE = 'sagwright.sqlite';

/**
 * The sqlite3 module as TypeORM's driver, less its debugging mode: TypeORM calls `verbose()` on
 * the driver it is given, which wraps every statement call to capture a stack trace and format its
 * arguments with util.inspect (node-sqlite3's "Debugging" notes), about a millisecond of CPU for
 * a page of springs.
 */
const quietSqlite3: typeof sqlite3 = Object.assign(Object.create(sqlite3) as typeof sqlite3, { verbose: () => sqlite3 });

export function dataSourceOptions(file: string, readOnly = false): DataSourceOptions {
  return {
    type: 'sqlite',
    driver: quietSqlite3,
    database: file,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    enableWAL: !readOnly,
    busyTimeout: 5000,
    busyErrorRetry: 50,
    flags: readOnly ? sqlite3.OPEN_READONLY : undefined,
    logging: false,
  };
}

/** For the TypeORM command line (`typeorm migration:show -d server/data-source.ts`). */
export const AppDataSource = new DataSource(
  dataSourceOptions(path.join(readConfig().dataDir, DATABASE_FILE)),
);

export class Database {
  private readonly queue = new WriteQueue();

  private constructor(
    readonly file: string,
    private readonly writer: DataSource,
    readonly read: DataSource,
  ) {}

  /** Opens (creating if need be) the database in dataDir and brings its schema up to date. */
  static async open(dataDir: string): Promise<Database> {
    fs.mkdirSync(dataDir, { recursive: true });
    const file = path.join(dataDir, DATABASE_FILE);
    const writer = new DataSource(dataSourceOptions(file));
    await writer.initialize();
    beginTransactionsImmediately(writer);
    await writer.runMigrations({ transaction: 'each' });
    const reader = new DataSource(dataSourceOptions(file, true));
    await reader.initialize();
    gateReads(reader);
    return new Database(file, writer, reader);
  }

  /** Runs fn in one transaction, after every write queued before it. */
  write<T>(fn: (manager: EntityManager) => Promise<T>): Promise<T> {
    return this.queue.run(() => this.writer.transaction(fn));
  }

  get pendingWrites(): number {
    return this.queue.depth;
  }

  async close(): Promise<void> {
    await this.read.destroy();
    await this.queue.run(() => this.writer.destroy());
  }
}
