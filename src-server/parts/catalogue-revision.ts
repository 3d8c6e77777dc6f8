import type { EntityManager } from 'typeorm';

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
