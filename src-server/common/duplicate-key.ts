import { DomainError } from './domain-error';

const ER_DUP_ENTRY = 1062;

/** Each unique key, with the answer a caller gets when a parallel write wins the race past the service's own check. */
const UNIQUE_KEYS: Record<string, { code: string; field?: string; message: string }> = {
  uq_users_email: { code: 'USER_EMAIL_TAKEN', field: 'email', message: 'That e-mail address already has an account or an invitation' },
  uq_bands_designation: { code: 'BAND_DESIGNATION_TAKEN', field: 'designation', message: 'A band with this designation already exists' },
  uq_band_sets_name: { code: 'BAND_SET_NAME_TAKEN', field: 'name', message: 'A band set with this name already exists' },
  uq_products_code: { code: 'PRODUCT_CODE_TAKEN', field: 'code', message: 'Another product already has this code' },
  uq_parts_manufacturer_mpn: { code: 'PART_MPN_TAKEN', field: 'mpn', message: 'This manufacturer already has a part with this MPN' },
  uq_assignment_radio_part: { code: 'ASSIGNMENT_EXISTS', field: 'partId', message: 'This part is already on the shortlist of this radio' },
  uq_assignment_one_choice: {
    code: 'ASSIGNMENT_CHOICE_TAKEN',
    field: 'partId',
    message: 'Another part was chosen for this radio at the same time; reload and try again',
  },
};

/** The unique key a MariaDB ER_DUP_ENTRY names ("… for key 'uq_x'" or "'table.uq_x'"), or null for any other error. */
export function duplicateKeyName(error: unknown): string | null {
  const err = (error ?? {}) as { driverError?: { errno?: number; sqlMessage?: string }; errno?: number; sqlMessage?: string };
  const driver = err.driverError ?? err;
  if (driver.errno !== ER_DUP_ENTRY) return null;
  const key = /for key '([^']+)'/.exec(driver.sqlMessage ?? '')?.[1] ?? '';
  return key.slice(key.lastIndexOf('.') + 1);
}

/** A 409 naming the field for a duplicate-key error, or null when the error is not one. */
export function duplicateKeyConflict(error: unknown): DomainError | null {
  const key = duplicateKeyName(error);
  if (key === null) return null;
  const known = UNIQUE_KEYS[key];
  if (!known) return new DomainError('DUPLICATE_ENTRY', 'A record with the same unique value already exists', 409);
  return new DomainError(known.code, known.message, 409, known.field ? { field: known.field } : {});
}
