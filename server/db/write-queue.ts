/**
 * TypeORM's SQLite driver shares one connection, so two overlapping transactions collide
 * ("cannot start a transaction within a transaction") and a query from one request can land
 * inside another's transaction. Every write therefore goes through this queue, one at a time.
 */
export class WriteQueue {
  private tail: Promise<unknown> = Promise.resolve();
  private waiting = 0;

  run<T>(task: () => Promise<T>): Promise<T> {
    this.waiting += 1;
    const settle = () => {
      this.waiting -= 1;
    };
    const result = this.tail.then(task, task);
    this.tail = result.then(settle, settle);
    return result;
  }

  /** Tasks queued or running; for health reporting and tests. */
  get depth(): number {
    return this.waiting;
  }
}
