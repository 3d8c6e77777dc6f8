import type { User } from '../users/user.entity';
import type { Part } from './part.entity';
import type { SpecBand } from './spec-band.entity';
import type { SpecBandClaim } from './spec-coverage';
import type { SpecBandDto, UserRefDto } from './dto/part-response.dto';

export const userRef = (user: User | null | undefined): UserRefDto | null => (user ? { id: user.id, name: user.name } : null);

export const iso = (date: Date | null | undefined): string | null => (date ? date.toISOString() : null);

export const specBandDto = (band: SpecBand): SpecBandDto => ({
  id: band.id,
  fromMhz: band.fromMhz,
  toMhz: band.toMhz,
  maxVswr: band.maxVswr,
  minReturnLossDb: band.minReturnLossDb,
  efficiencyPct: band.efficiencyPct,
  efficiencyBasis: band.efficiencyBasis,
  efficiencyStatistic: band.efficiencyStatistic,
  peakGainDbi: band.peakGainDbi,
  averageGainDbi: band.averageGainDbi,
  gainBasis: band.gainBasis,
});

export const specBandClaim = (
  band: Pick<
    SpecBand,
    | 'fromMhz'
    | 'toMhz'
    | 'maxVswr'
    | 'minReturnLossDb'
    | 'efficiencyPct'
    | 'efficiencyBasis'
    | 'efficiencyStatistic'
    | 'peakGainDbi'
    | 'averageGainDbi'
    | 'gainBasis'
  >,
): SpecBandClaim => ({
  fromHz: band.fromMhz * 1e6,
  toHz: band.toMhz * 1e6,
  maxVswr: band.maxVswr ?? null,
  minReturnLossDb: band.minReturnLossDb ?? null,
  efficiencyPct: band.efficiencyPct ?? null,
  efficiencyBasis: band.efficiencyBasis,
  efficiencyStatistic: band.efficiencyStatistic,
  peakGainDbi: band.peakGainDbi ?? null,
  averageGainDbi: band.averageGainDbi ?? null,
  gainBasis: band.gainBasis,
});

/** The text the search matches: manufacturer, MPN, title and notes. */
export const searchTextOf = (manufacturer: string, part: Pick<Part, 'mpn' | 'title' | 'notes'>): string =>
  [manufacturer, part.mpn, part.title, part.notes ?? ''].join(' ').slice(0, 6000);
