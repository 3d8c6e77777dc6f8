import { Inject, Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { APP_CONFIG, type AppConfig } from '../../config/app-config';
import type { AuthUser } from '../../common/auth.decorators';
import { AuditService } from '../../audit/audit.service';
import { MailService, type OutgoingMail } from '../../mail/mail.service';
import { User } from '../../users/user.entity';
import { touchPart } from '../catalogue-revision';
import { Manufacturer } from '../manufacturer.entity';
import { Part } from '../part.entity';
import { assertCanEdit } from '../part-access';
import { iso, userRef } from '../part-mapping';
import type { ReviewState } from '../part.types';
import { partErrors } from '../parts.exception';
import { PartsService } from '../catalogue/parts.service';
import { PartDataService } from '../part-data.service';
import { checkPartConsistency } from './part-consistency';
import { NotFoundError } from '../../common/domain-error';
import type { PartConsistencyDto } from '../dto/consistency.dto';
import type { ReviewActionDto } from '../dto/part-input.dto';
import type { PartDetailDto, ReviewQueueItemDto } from '../dto/part-response.dto';

export type ReviewAction = 'submit' | 'approve' | 'reject' | 'restrict' | 'reinstate' | 'retire';

interface Transition {
  from: ReviewState[];
  to: ReviewState;
  verb: string;
  commentRequired: boolean;
}

/** The review lifecycle: draft → in-review → approved → restricted / retired; rejection returns to draft. */
export const TRANSITIONS: Record<ReviewAction, Transition> = {
  submit: { from: ['draft'], to: 'in-review', verb: 'submitted', commentRequired: false },
  approve: { from: ['in-review'], to: 'approved', verb: 'approved', commentRequired: false },
  reject: { from: ['in-review'], to: 'draft', verb: 'rejected', commentRequired: true },
  restrict: { from: ['approved'], to: 'restricted', verb: 'restricted', commentRequired: true },
  reinstate: { from: ['restricted'], to: 'approved', verb: 'reinstated', commentRequired: false },
  retire: { from: ['approved', 'restricted'], to: 'retired', verb: 'retired', commentRequired: false },
};

@Injectable()
export class ReviewService {
  private readonly logger = new Logger(ReviewService.name);

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly parts: PartsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly partData: PartDataService,
  ) {}

  async transition(id: number, action: ReviewAction, input: ReviewActionDto, actor: AuthUser): Promise<PartDetailDto> {
    const rule = TRANSITIONS[action];
    const comment = input.comment?.trim() || null;
    if (rule.commentRequired && !comment) throw partErrors.commentRequired(action);
    const outgoing = await this.dataSource.transaction(async (manager) => {
      const part = await this.parts.lockPart(manager, id);
      // Submission is the engineer's step on their own draft; the others are admin-only routes.
      if (action === 'submit') assertCanEdit(actor, part, 'submit');
      if (part.version !== input.version) throw partErrors.versionConflict(id, input.version, part.version);
      if (!rule.from.includes(part.reviewState)) throw partErrors.wrongState(id, part.reviewState, rule.verb, rule.from);
      const now = new Date();
      const changes: Partial<Part> = { reviewState: rule.to, version: part.version + 1 };
      if (action === 'submit') Object.assign(changes, { submittedById: actor.id, submittedAt: now, reviewComment: null });
      else Object.assign(changes, { reviewedById: actor.id, reviewedAt: now, reviewComment: comment ?? (action === 'approve' ? null : part.reviewComment) });
      await manager.update(Part, { id }, changes);
      await touchPart(manager, id);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: id,
        action: rule.verb,
        userId: actor.id,
        changes: { reviewState: [part.reviewState, rule.to], ...(comment ? { comment } : {}) },
      });
      const manufacturer = (await manager.findOneByOrFail(Manufacturer, { id: part.manufacturerId })).name;
      const label = `${manufacturer} ${part.mpn}`;
      const link = `${this.config.appUrl}/catalogue/parts/${id}`;
      if (action === 'submit') {
        const admins = await manager.find(User, { where: { role: 'admin', status: 'active' } });
        if (admins.length === 0) return null;
        return {
          to: admins.map((a) => a.email),
          subject: `Part for review: ${label}`,
          text: `${actor.name} submitted ${label} (${part.title}) for review.\n\nReview it here:\n${link}\n\nThe review queue: ${this.config.appUrl}/catalogue/review\n`,
        } satisfies OutgoingMail;
      }
      if ((action === 'approve' || action === 'reject') && part.submittedById) {
        const submitter = await manager.findOneBy(User, { id: part.submittedById });
        if (!submitter) return null;
        const verdict = action === 'approve' ? 'approved' : 'rejected';
        return {
          to: submitter.email,
          subject: `Part ${verdict}: ${label}`,
          text:
            `Hello ${submitter.name},\n\n${actor.name} ${verdict} ${label} (${part.title}).\n` +
            (comment ? `\nComment:\n${comment}\n` : '') +
            (action === 'reject' ? '\nThe part is back in draft; edit it and submit it again.\n' : '') +
            `\n${link}\n`,
        } satisfies OutgoingMail;
      }
      return null;
    });
    // The change is committed; a mail outage must not undo it, so it is logged instead.
    if (outgoing) await this.mail.send(outgoing).catch((error: Error) => this.logger.warn(`review mail for part ${id} not sent: ${error.message}`));
    return this.parts.getDetail(id, actor);
  }

  /** Datasheet counts of the given parts (documents of kind "datasheet"). */
  private async datasheetCounts(ids: number[]): Promise<Map<number, number>> {
    const rows: { part_id: number; n: number | string }[] = await this.dataSource.query(
      "SELECT part_id, COUNT(*) AS n FROM part_documents WHERE part_id IN (?) AND kind = 'datasheet' GROUP BY part_id",
      [ids],
    );
    return new Map(rows.map((r) => [r.part_id, Number(r.n)]));
  }

  /** The review aid of each part: its claims against its measurements, what is missing, the implied directivity. */
  private async consistencyOf(ids: number[]): Promise<Map<number, PartConsistencyDto>> {
    const [data, datasheets] = await Promise.all([this.partData.getPartData(ids), this.datasheetCounts(ids)]);
    return new Map(
      data.map((p) => [
        p.id,
        checkPartConsistency({
          formFactor: p.formFactor,
          datasheetCount: datasheets.get(p.id) ?? 0,
          specBands: p.specBands,
          s11: p.s11?.curve ?? null,
          efficiency: p.efficiency,
          peakGain: p.peakGain,
        }),
      ]),
    );
  }

  /** One part's review aid (every role: the part page shows the implied directivity). */
  async consistency(id: number): Promise<PartConsistencyDto> {
    const check = (await this.consistencyOf([id])).get(id);
    if (!check) throw new NotFoundError('part', id);
    return check;
  }

  /** Parts waiting for an admin, oldest submission first, each with its review aid. */
  async queue(): Promise<ReviewQueueItemDto[]> {
    const parts = await this.dataSource.getRepository(Part).find({
      where: { reviewState: 'in-review' },
      relations: { manufacturer: true, submittedBy: true },
      order: { submittedAt: 'ASC', id: 'ASC' },
    });
    if (parts.length === 0) return [];
    const ids = parts.map((p) => p.id);
    const kinds: { part_id: number; kind: string }[] = await this.dataSource.query(
      'SELECT DISTINCT part_id, kind FROM part_measurements WHERE part_id IN (?)',
      [ids],
    );
    const docs: { part_id: number; n: number | string }[] = await this.dataSource.query(
      'SELECT part_id, COUNT(*) AS n FROM part_documents WHERE part_id IN (?) GROUP BY part_id',
      [ids],
    );
    const checks = await this.consistencyOf(ids);
    return parts.map((p) => ({
      id: p.id,
      manufacturer: p.manufacturer.name,
      mpn: p.mpn,
      title: p.title,
      version: p.version,
      submittedBy: userRef(p.submittedBy),
      submittedAt: iso(p.submittedAt),
      measuredKinds: kinds.filter((k) => k.part_id === p.id).map((k) => k.kind) as ReviewQueueItemDto['measuredKinds'],
      documentCount: Number(docs.find((d) => d.part_id === p.id)?.n ?? 0),
      check: checks.get(p.id)!,
    }));
  }
}
