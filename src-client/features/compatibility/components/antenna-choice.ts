import type { AntennaRole } from '../../../lib/antenna-role-labels';
import type { ProductEvaluation } from '../types';

/** The antenna each chosen part of a radio is for, by part id (a part is chosen for at most one antenna of a radio). */
export function chosenRoles(evaluation: Pick<ProductEvaluation, 'radios'> | undefined, radioId: number): Map<number, AntennaRole> {
  const radio = evaluation?.radios.find((r) => r.radioId === radioId);
  return new Map((radio?.chosen ?? []).map((p) => [p.partId, p.role]));
}

/** The antenna the candidates dialog offers first: the first one of the radio without a chosen part, else the main one. */
export function firstOpenRole(roles: readonly AntennaRole[], chosen: ReadonlyMap<number, AntennaRole>): AntennaRole {
  const taken = new Set(chosen.values());
  return roles.find((role) => !taken.has(role)) ?? roles[0] ?? 'main';
}
