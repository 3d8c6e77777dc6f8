import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { duplicateKeyName } from '../common/duplicate-key';
import { isRetryableLockError, transactionWithRetry } from '../common/transaction-retry';
import { AuditService, type AuditEntryView } from '../audit/audit.service';
import type { AuthUser } from '../common/auth.decorators';
import { DomainError, NotFoundError, ValidationFailedError } from '../common/domain-error';
import { Radio } from '../products/radio.entity';
import type { AntennaRole } from '../products/in-product/antenna-roles';
import { PartDataService } from '../parts/part-data.service';
import { ProductsService } from '../products/products.service';
import { PartAssignment } from './compatibility.entities';
import type { AssignmentDto } from './dto/matrix.dto';

const assignmentDto = (a: PartAssignment, part: { mpn: string; title: string } | undefined): AssignmentDto => ({
  id: a.id,
  productId: a.productId,
  radioId: a.radioId,
  partId: a.partId,
  mpn: part?.mpn ?? '',
  title: part?.title ?? '',
  state: a.state,
  role: a.role,
  note: a.note,
  updatedAt: a.updatedAt.toISOString(),
});

const ASSIGNMENT_ATTEMPTS = 6;
// Parallel shortlist/choice calls on one radio deadlock on gap locks or collide on a unique key; rerun, they then see the winner's row.
const retryAssignmentRace = (error: unknown) => isRetryableLockError(error) || (duplicateKeyName(error) ?? '').startsWith('uq_assignment_');

/** The shortlisted and chosen parts of a product's radios, and their history. */
@Injectable()
export class AssignmentsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly products: ProductsService,
    private readonly partData: PartDataService,
    private readonly audit: AuditService,
  ) {}

  async listAssignments(productId: number): Promise<AssignmentDto[]> {
    await this.products.getWithRadios(productId);
    const rows = await this.dataSource.getRepository(PartAssignment).find({ where: { productId }, order: { radioId: 'ASC', id: 'ASC' } });
    const parts = await this.partData.getPartData(rows.map((r) => r.partId));
    return rows.map((r) =>
      assignmentDto(
        r,
        parts.find((p) => p.id === r.partId),
      ),
    );
  }

  async shortlist(productId: number, radioId: number, partId: number, note: string | undefined, actor: AuthUser): Promise<AssignmentDto[]> {
    await this.checkRadioAndPart(productId, radioId, partId);
    await transactionWithRetry(
      this.dataSource,
      async (manager) => {
        const existing = await manager.findOne(PartAssignment, { where: { radioId, partId }, lock: { mode: 'pessimistic_write' } });
        if (existing) return;
        await manager.insert(PartAssignment, { productId, radioId, partId, state: 'shortlisted', note: note ?? null, createdById: actor.id });
        await this.audit.record(manager, {
          entityType: 'product-assignment',
          entityId: productId,
          action: 'shortlisted',
          userId: actor.id,
          changes: { radioId, partId },
        });
      },
      ASSIGNMENT_ATTEMPTS,
      retryAssignmentRace,
    );
    return this.listAssignments(productId);
  }

  async removeFromShortlist(productId: number, radioId: number, partId: number, actor: AuthUser): Promise<AssignmentDto[]> {
    await this.products.assertExists(productId);
    await transactionWithRetry(
      this.dataSource,
      async (manager) => {
        const existing = await manager.findOne(PartAssignment, { where: { productId, radioId, partId }, lock: { mode: 'pessimistic_write' } });
        if (!existing) throw new DomainError('ASSIGNMENT_NOT_FOUND', `part ${partId} is not on the shortlist of radio ${radioId}`, 404);
        await manager.delete(PartAssignment, { id: existing.id });
        await this.audit.record(manager, {
          entityType: 'product-assignment',
          entityId: productId,
          action: 'removed',
          userId: actor.id,
          changes: { radioId, partId, state: existing.state },
        });
      },
      ASSIGNMENT_ATTEMPTS,
      retryAssignmentRace,
    );
    return this.listAssignments(productId);
  }

  /** One chosen part per radio: the previous choice goes back to the shortlist, in the same transaction. */
  async choose(productId: number, radioId: number, partId: number, actor: AuthUser, role: AntennaRole = 'main'): Promise<AssignmentDto[]> {
    await this.checkRadioAndPart(productId, radioId, partId);
    const radio = await this.dataSource.getRepository(Radio).findOneBy({ id: radioId });
    const roles = radio?.antennaRoles?.length ? radio.antennaRoles : ['main'];
    if (!roles.includes(role)) throw new ValidationFailedError([{ field: 'role', message: `the radio's antennas are ${roles.join(', ')}` }]);
    await transactionWithRetry(
      this.dataSource,
      async (manager) => {
        const rows = await manager.find(PartAssignment, { where: { radioId }, lock: { mode: 'pessimistic_write' } });
        const previous = rows.find((r) => r.state === 'chosen' && r.role === role);
        if (previous?.partId === partId) return;
        if (previous) await manager.update(PartAssignment, { id: previous.id }, { state: 'shortlisted', role: 'main' });
        const existing = rows.find((r) => r.partId === partId);
        if (existing) await manager.update(PartAssignment, { id: existing.id }, { state: 'chosen', role });
        else await manager.insert(PartAssignment, { productId, radioId, partId, state: 'chosen', role, createdById: actor.id });
        await this.audit.record(manager, {
          entityType: 'product-assignment',
          entityId: productId,
          action: 'chosen',
          userId: actor.id,
          changes: { radioId, ...(role === 'main' ? {} : { role }), partId: [previous?.partId ?? null, partId] },
        });
      },
      ASSIGNMENT_ATTEMPTS,
      retryAssignmentRace,
    );
    return this.listAssignments(productId);
  }

  async clearChoice(productId: number, radioId: number, actor: AuthUser): Promise<AssignmentDto[]> {
    await this.products.assertExists(productId);
    await transactionWithRetry(
      this.dataSource,
      async (manager) => {
        const chosen = await manager.findOne(PartAssignment, { where: { productId, radioId, state: 'chosen' }, lock: { mode: 'pessimistic_write' } });
        if (!chosen) throw new DomainError('ASSIGNMENT_NOT_FOUND', `radio ${radioId} has no chosen part`, 404);
        await manager.update(PartAssignment, { id: chosen.id }, { state: 'shortlisted', role: 'main' });
        await this.audit.record(manager, {
          entityType: 'product-assignment',
          entityId: productId,
          action: 'unchosen',
          userId: actor.id,
          changes: { radioId, partId: chosen.partId },
        });
      },
      ASSIGNMENT_ATTEMPTS,
      retryAssignmentRace,
    );
    return this.listAssignments(productId);
  }

  async history(productId: number): Promise<{ items: AuditEntryView[]; total: number }> {
    await this.products.getWithRadios(productId);
    return this.audit.list({ entityType: 'product-assignment', entityId: productId, limit: 500 });
  }

  private async checkRadioAndPart(productId: number, radioId: number, partId: number): Promise<void> {
    await this.products.getRadio(productId, radioId);
    const [part] = await this.partData.getPartData([partId]);
    if (!part) throw new NotFoundError('part', partId);
  }
}
