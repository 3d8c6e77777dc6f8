import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { DateField, IntField, PatchType, StringField } from './dto-fields';

class Thing {
  @StringField({ maxLength: 20 }) name: string;
  @StringField({ optional: true, maxLength: 20 }) label?: string;
  @StringField({ optional: true, nullable: true, maxLength: 20 }) note?: string | null;
  @IntField({ optional: true }) count?: number;
  @DateField({ optional: true }) checkedOn?: string;
}
class ThingPatch extends PatchType(Thing) {}

const refused = (cls: new () => object, plain: object) => validateSync(plainToInstance(cls, plain) as object).map((error) => error.property);

describe('dto-fields', () => {
  it('a PATCH leaves out anything, refuses null for required and optional fields, and keeps null for nullable ones', () => {
    expect(refused(ThingPatch, {})).toEqual([]);
    expect(refused(ThingPatch, { name: null, label: null, note: null })).toEqual(['name', 'label']);
    expect(refused(Thing, { name: 'x', label: null })).toEqual(['label']);
  });

  it('an integer without bounds of its own stays within the INT column range', () => {
    expect(refused(Thing, { name: 'x', count: 2 ** 31 - 1 })).toEqual([]);
    expect(refused(Thing, { name: 'x', count: 2 ** 31 })).toEqual(['count']);
    expect(refused(Thing, { name: 'x', count: 1e20 })).toEqual(['count']);
  });

  it('a date must exist in the calendar and fall within the year range', () => {
    expect(refused(Thing, { name: 'x', checkedOn: '2024-02-29' })).toEqual([]);
    for (const checkedOn of ['2025-02-31', '2025-02-29', '9999-99-99', '0000-00-00', '1899-12-31', '2025-1-1', '2025-01-01T00:00:00Z']) {
      expect([checkedOn, refused(Thing, { name: 'x', checkedOn })]).toEqual([checkedOn, ['checkedOn']]);
    }
  });

  it('no server DTO uses PartialType directly (it lets null through to NOT NULL columns)', () => {
    const root = join(__dirname, '..');
    const files = (dir: string): string[] =>
      readdirSync(dir).flatMap((name) => {
        const path = join(dir, name);
        return statSync(path).isDirectory() ? files(path) : path.endsWith('.ts') && !path.endsWith('.spec.ts') ? [path] : [];
      });
    const offenders = files(root).filter((path) => !path.endsWith('dto-fields.ts') && /\bPartialType\(/.test(readFileSync(path, 'utf8')));
    expect(offenders).toEqual([]);
  });
});
