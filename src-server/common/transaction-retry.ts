import type { DataSource, EntityManager } from 'typeorm';

// MariaDB picks a victim when two transactions wait on each other; rerunning the victim is the remedy.
const RETRYABLE = new Set([1213 /* ER_LOCK_DEADLOCK */, 1205 /* ER_LOCK_WAIT_TIMEOUT */]);

export const isRetryableLockError = (error: unknown): boolean => {
  const driver = (error as { driverError?: { errno?: number }; errno?: number }) ?? {};
  return RETRYABLE.has(driver.driverError?.errno ?? driver.errno ?? -1);
};

/**
 * Runs the work in a transaction, again (up to `attempts` times) when the database chose it as a deadlock victim
 * (or `retryOn` says so, e.g. an idempotent insert that lost a race and will find the winner's row next time).
 */
export async function transactionWithRetry<T>(
  dataSource: DataSource,
  work: (manager: EntityManager) => Promise<T>,
  attempts = 4,
  retryOn: (error: unknown) => boolean = isRetryableLockError,
): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await dataSource.transaction(work);
    } catch (error) {
      if (attempt >= attempts || !retryOn(error)) throw error;
      await new Promise((r) => setTimeout(r, 5 + Math.random() * 20 * attempt));
    }
  }
}
