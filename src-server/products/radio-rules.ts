import type { FieldProblem } from '../common/domain-error';
import { RECEIVE_ONLY_TECHNOLOGIES, type Technology } from '../bands/band-domain';

export interface RadioBandChoice {
  bandId: number;
  certifiedMaxGainDbi?: number | null;
}

export interface RadioDraft {
  technology: Technology;
  transmitPowerDbm: number | null;
  bands: RadioBandChoice[];
}

export interface KnownBand {
  id: number;
  technology: Technology;
  designation: string;
}

export const isReceiveOnly = (technology: Technology): boolean => RECEIVE_ONLY_TECHNOLOGIES.includes(technology);

/**
 * Cross-field rules of a radio that a DTO cannot express; each problem names the field path
 * the way the validation pipe does (`bands.2.bandId`). Pure, so it tests without a database.
 */
export function radioProblems(draft: RadioDraft, library: ReadonlyMap<number, KnownBand>): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const receiveOnly = isReceiveOnly(draft.technology);
  if (receiveOnly && draft.transmitPowerDbm !== null) {
    problems.push({ field: 'transmitPowerDbm', message: `a ${draft.technology} radio is receive-only and has no transmit power; leave it empty` });
  }
  if (!receiveOnly && draft.transmitPowerDbm === null) {
    problems.push({ field: 'transmitPowerDbm', message: `is required for a transmitting ${draft.technology} radio` });
  }
  const seen = new Set<number>();
  draft.bands.forEach((choice, i) => {
    const band = library.get(choice.bandId);
    if (!band) {
      problems.push({ field: `bands.${i}.bandId`, message: `band ${choice.bandId} is not in the band library` });
      return;
    }
    if (band.technology !== draft.technology) {
      problems.push({
        field: `bands.${i}.bandId`,
        message: `${band.designation} is a ${band.technology} band; a ${draft.technology} radio takes only ${draft.technology} bands`,
      });
    }
    if (seen.has(band.id)) problems.push({ field: `bands.${i}.bandId`, message: `${band.designation} is listed twice` });
    seen.add(band.id);
    if (receiveOnly && choice.certifiedMaxGainDbi !== null && choice.certifiedMaxGainDbi !== undefined) {
      problems.push({ field: `bands.${i}.certifiedMaxGainDbi`, message: 'a receive-only radio has no certified transmit-antenna gain; leave it empty' });
    }
  });
  return problems;
}
