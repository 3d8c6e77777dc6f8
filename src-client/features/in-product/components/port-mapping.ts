import type { ApiError } from '../../../lib/api-client';
import { ANTENNA_ROLE_LABELS } from '../../../lib/antenna-role-labels';
import type { AntennaRole, InProductMeasurement, PortAssignment, RadioChoice } from '../types';

/** One port of the file as the mapping form holds it; radioId null: not used. */
export interface MappingRow {
  port: number;
  radioId: number | null;
  role: AntennaRole | null;
}

/** Every port of the file, 1 to N, with its saved mapping or not used. */
export function mappingRowsOf(m: Pick<InProductMeasurement, 'ports' | 'portMapping'>): MappingRow[] {
  return Array.from({ length: m.ports }, (_, i) => {
    const saved = m.portMapping.find((p) => p.port === i + 1);
    return { port: i + 1, radioId: saved?.radioId ?? null, role: saved?.role ?? null };
  });
}

const rolesOf = (radios: readonly RadioChoice[], radioId: number): AntennaRole[] => {
  const roles = radios.find((r) => r.id === radioId)?.antennaRoles ?? [];
  return roles.length ? roles : ['main'];
};

/** The antenna roles the form offers for a radio (a radio stating none has one main antenna). */
export const roleChoices = (radios: readonly RadioChoice[], radioId: number | null): AntennaRole[] => (radioId === null ? [] : rolesOf(radios, radioId));

/** A port given another radio (or none): its role becomes that radio's first antenna no other port has taken yet. */
export function withRadio(rows: readonly MappingRow[], port: number, radioId: number | null, radios: readonly RadioChoice[]): MappingRow[] {
  if (radioId === null) return rows.map((r) => (r.port === port ? { port, radioId: null, role: null } : r));
  const roles = rolesOf(radios, radioId);
  const taken = new Set(rows.filter((r) => r.port !== port && r.radioId === radioId).map((r) => r.role));
  const role = roles.find((x) => !taken.has(x)) ?? roles[0];
  return rows.map((r) => (r.port === port ? { port, radioId, role } : r));
}

export const withRole = (rows: readonly MappingRow[], port: number, role: AntennaRole): MappingRow[] => rows.map((r) => (r.port === port ? { ...r, role } : r));

/** The PUT body: the mapped ports only, by port number. */
export const mappingBody = (rows: readonly MappingRow[]): PortAssignment[] =>
  rows.flatMap((r) => (r.radioId !== null && r.role !== null ? [{ port: r.port, radioId: r.radioId, role: r.role }] : []));

/** What the form can tell before saving, by port: one antenna of a radio on two ports, or a role the radio no longer has. */
export function mappingProblems(rows: readonly MappingRow[], radios: readonly RadioChoice[]): Map<number, string> {
  const problems = new Map<number, string>();
  const firstPort = new Map<string, number>();
  for (const row of rows) {
    if (row.radioId === null || row.role === null) continue;
    const radio = radios.find((r) => r.id === row.radioId);
    if (!radio) {
      problems.set(row.port, 'This radio is no longer part of the product');
      continue;
    }
    if (!rolesOf(radios, row.radioId).includes(row.role)) {
      problems.set(row.port, `${radio.name} has no ${ANTENNA_ROLE_LABELS[row.role]} antenna`);
      continue;
    }
    const antenna = `${row.radioId}/${row.role}`;
    const earlier = firstPort.get(antenna);
    if (earlier === undefined) firstPort.set(antenna, row.port);
    else problems.set(row.port, `The ${ANTENNA_ROLE_LABELS[row.role]} antenna of ${radio.name} is already port ${earlier}`);
  }
  return problems;
}

const FIELD_WORDS: Record<string, string> = { port: 'port', radioId: 'radio', role: 'antenna' };

/**
 * The server's refusal in words: a VALIDATION_FAILED names `[i].port`, `[i].radioId` or `[i].role` of the body sent,
 * which becomes "Port 3, antenna: …"; any other error is its message.
 */
export function refusalLines(error: Pick<ApiError, 'message' | 'fieldErrors'>, sent: readonly PortAssignment[]): string[] {
  const fields = Object.entries(error.fieldErrors);
  if (fields.length === 0) return [error.message];
  return fields.map(([field, message]) => {
    const at = /^\[(\d+)\]\.?(\w*)$/.exec(field);
    const item = at ? sent[Number(at[1])] : undefined;
    if (!at || !item) return message;
    const what = FIELD_WORDS[at[2]];
    return `Port ${item.port}${what ? `, ${what}` : ''}: ${message}`;
  });
}
