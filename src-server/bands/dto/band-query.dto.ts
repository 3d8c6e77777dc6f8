import { EnumField, NumberField, StringField } from '../../common/dto-fields';
import { TECHNOLOGIES, type Technology } from '../band-domain';

export class BandQueryDto {
  @EnumField(TECHNOLOGIES, { enumName: 'Technology', optional: true })
  technology?: Technology;

  @StringField({ optional: true, maxLength: 40, description: 'Exact designation, e.g. B12, n78, GPS L1 (case-insensitive)' })
  designation?: string;

  @NumberField({ optional: true, min: 0, max: 300000, description: 'With toMhz: only bands with a range overlapping [fromMhz, toMhz]' })
  fromMhz?: number;

  @NumberField({ optional: true, min: 0, max: 300000 })
  toMhz?: number;
}
