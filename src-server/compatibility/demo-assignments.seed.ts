import type { AntennaRole } from '../products/in-product/antenna-roles';
import type { DataSource } from 'typeorm';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { PartAssignment, type AssignmentState } from './compatibility.entities';

interface DemoAssignment {
  id: number;
  productId: number;
  radioId: number;
  partId: number;
  state: AssignmentState;
  role?: AntennaRole;
  note: string;
}

/** Demo shortlists and choices from catalog-seed/assignments.json; rows whose product, radio or part is absent are skipped. */
export async function seedDemoAssignments(dataSource: DataSource): Promise<string> {
  const { assignments }: { assignments: DemoAssignment[] } = JSON.parse(readFileSync(resolve('catalog-seed/assignments.json'), 'utf8'));
  let created = 0;
  let skipped = 0;
  await dataSource.transaction(async (manager) => {
    for (const a of assignments) {
      if (await manager.existsBy(PartAssignment, { id: a.id })) continue;
      const [{ ok }] = await manager.query(
        'SELECT (SELECT COUNT(*) FROM radios WHERE id = ? AND product_id = ?) * (SELECT COUNT(*) FROM parts WHERE id = ?) AS ok',
        [a.radioId, a.productId, a.partId],
      );
      // A radio that already has a choice (someone chose in the demo) keeps it.
      const choiceTaken = a.state === 'chosen' && (await manager.existsBy(PartAssignment, { radioId: a.radioId, state: 'chosen', role: a.role ?? 'main' }));
      const pairTaken = await manager.existsBy(PartAssignment, { radioId: a.radioId, partId: a.partId });
      if (Number(ok) === 0 || choiceTaken || pairTaken) {
        skipped += 1;
        continue;
      }
      await manager.insert(PartAssignment, {
        id: a.id,
        productId: a.productId,
        radioId: a.radioId,
        partId: a.partId,
        state: a.state,
        role: a.role ?? 'main',
        note: a.note,
        createdById: null,
      });
      created += 1;
    }
  });
  return `${created} created, ${assignments.length - created - skipped} already present, ${skipped} skipped`;
}
