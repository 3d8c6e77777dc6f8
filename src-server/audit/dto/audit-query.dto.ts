import { IntField, StringField } from '../../common/dto-fields';

export class AuditQueryDto {
  @StringField({ optional: true, maxLength: 40, description: 'Record type, e.g. part, product, user' })
  entityType?: string;

  @StringField({ optional: true, maxLength: 40 })
  entityId?: string;

  @IntField({ optional: true, min: 1, max: 500, description: 'Page size (default 100)' })
  limit?: number;

  @IntField({ optional: true, min: 0 })
  offset?: number;
}
