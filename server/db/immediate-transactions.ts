/**
 * Write transactions that take SQLite's write lock when they begin (BEGIN IMMEDIATE) instead of
 * at their first write. A deferred transaction that has read and then finds that another
 * connection wrote meanwhile can never write (SQLITE_BUSY_SNAPSHOT: waiting does not help, and
 * TypeORM would retry the statement for ever, stalling the write queue behind it). One that begins
 * IMMEDIATE waits under the busy timeout for the other writer to finish, then reads what it wrote.
 */
import { DataSource } from 'typeorm';
import { SqliteDriver } from 'typeorm/driver/sqlite/SqliteDriver.js';
import { SqliteQueryRunner } from 'typeorm/driver/sqlite/SqliteQueryRunner.js';

/** What TypeORM's SQLite query runner sends to open an outermost transaction. */
const DEFERRED_BEGIN = 'BEGIN TRANSACTION';

class ImmediateQueryRunner extends SqliteQueryRunner {
  override query(...[sql, ...rest]: Parameters<SqliteQueryRunner['query']>): ReturnType<SqliteQueryRunner['query']> {
    return super.query(sql === DEFERRED_BEGIN ? 'BEGIN IMMEDIATE TRANSACTION' : sql, ...rest);
  }
}

/** The SQLite driver keeps one query runner for its one connection; this replaces it. */
export function beginTransactionsImmediately(source: DataSource): void {
  const driver = source.driver as SqliteDriver;
  driver.queryRunner = new ImmediateQueryRunner(driver);
}
