import type { DataSource, EntityManager } from 'typeorm';
import { RevisionReader } from '../common/revision-cache';

/**
 * Marks a part changed for every server's search index: bumps the one-row catalogue revision (its
 * row lock orders concurrent writers) and stamps the part with the new value.
 */
export async function touchPart(manager: EntityManager, partId: number): Promise<number> {
  await manager.query('UPDATE catalogue_revision SET revision = LAST_INSERT_ID(revision + 1) WHERE id = 1');
  const [{ revision }] = await manager.query('SELECT LAST_INSERT_ID() AS revision');
  await manager.query('UPDATE parts SET revision = ? WHERE id = ?', [revision, partId]);
  return Number(revision);
}

/** The catalogue revision, read fresh for each caller (see RevisionReader); every cache of part data keys on it. */
export function catalogueRevisionReader(dataSource: DataSource): RevisionReader {
  return new RevisionReader(async () => {
    const rows: { revision: string | number }[] = await dataSource.query('SELECT revision FROM catalogue_revision WHERE id = 1');
    return Number(rows[0]?.revision ?? 0);
  });
}
