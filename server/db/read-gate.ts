/**
 * node-sqlite3 runs each statement on libuv's thread pool (4 threads by default), and a connection
 * runs one statement at a time, so statements queued beyond that hold pool threads while they wait
 * for the connection. Under a burst of reads the reader's backlog took every pool thread and each
 * statement of a write transaction waited behind all of it: a stock movement took seconds while
 * reads flowed. The gate lets the read-only connection have at most READS_IN_FLIGHT statements
 * with the pool; the rest wait here, in order, and pool threads stay free for the writer.
 */
import { DataSource } from 'typeorm';
import { SqliteDriver } from 'typeorm/driver/sqlite/SqliteDriver.js';
import { SqliteQueryRunner } from 'typeorm/driver/sqlite/SqliteQueryRunner.js';

/** One statement running on the connection and one ready behind it. */
const READS_IN_FLIGHT = 2;

class Gate {
  private active = 0;
  private readonly waiting: (() => void)[] = [];

  constructor(private readonly limit: number) {}

  async run<T>(task: () => Promise<T>): Promise<T> {
    if (this.active < this.limit) this.active += 1;
    else await new Promise<void>((resolve) => this.waiting.push(resolve));
    try {
      return await task();
    } finally {
      const next = this.waiting.shift();
      if (next) next();
      else this.active -= 1;
    }
  }
}

class GatedQueryRunner extends SqliteQueryRunner {
  private readonly gate = new Gate(READS_IN_FLIGHT);

  override query(...args: Parameters<SqliteQueryRunner['query']>): ReturnType<SqliteQueryRunner['query']> {
    return this.gate.run(() => super.query(...args));
  }
}

/** The SQLite driver keeps one query runner for its one connection; this replaces it. */
export function gateReads(source: DataSource): void {
  const driver = source.driver as SqliteDriver;
  driver.queryRunner = new GatedQueryRunner(driver);
}
