import type { FieldProblem } from '../common/domain-error';
import { type GnssBandwidth, type RangeRole, RECEIVE_ONLY_TECHNOLOGIES, type Technology } from '../bands/band-domain';

/** A channel as sent: edges, or centre and bandwidth. */
export interface ChannelInput {
  fromMhz?: number;
  toMhz?: number;
  centreMhz?: number;
  bandwidthMhz?: number;
}

export interface RadioBandChoice {
  bandId: number;
  certifiedMaxGainDbi?: number | null;
  channels?: ChannelInput[] | null;
}

export interface RadioDraft {
  technology: Technology;
  transmitPowerDbm: number | null;
  gnssBandwidth?: GnssBandwidth | null;
  bands: RadioBandChoice[];
}

export interface KnownBand {
  id: number;
  technology: Technology;
  designation: string;
  ranges?: { role: RangeRole; fromMhz: number; toMhz: number }[];
}

/** To 1 Hz: a centre ± half a bandwidth lands on a published sub-band edge instead of a hair beside it. */
const toHzGrid = (mhz: number) => Math.round(mhz * 1e6) / 1e6;

/** A channel's edges in MHz, or why it cannot be read (which field is wrong). */
export function channelEdges(channel: ChannelInput): { fromMhz: number; toMhz: number } | { problem: string } {
  const edges = channel.fromMhz !== undefined || channel.toMhz !== undefined;
  const centred = channel.centreMhz !== undefined || channel.bandwidthMhz !== undefined;
  if (edges && centred) return { problem: 'give either fromMhz and toMhz, or centreMhz and bandwidthMhz, not both' };
  if (edges) {
    if (channel.fromMhz === undefined || channel.toMhz === undefined) return { problem: 'fromMhz and toMhz go together' };
    if (!(channel.toMhz > channel.fromMhz)) return { problem: `toMhz must be above fromMhz (${channel.fromMhz})` };
    return { fromMhz: toHzGrid(channel.fromMhz), toMhz: toHzGrid(channel.toMhz) };
  }
  if (channel.centreMhz === undefined || channel.bandwidthMhz === undefined) return { problem: 'give fromMhz and toMhz, or centreMhz and bandwidthMhz' };
  return { fromMhz: toHzGrid(channel.centreMhz - channel.bandwidthMhz / 2), toMhz: toHzGrid(channel.centreMhz + channel.bandwidthMhz / 2) };
}

/** The ranges a transmitting radio sends in (uplink, TDD, transmit-receive); a band naming none: all of them. */
function transmitRangesOf(band: KnownBand): { fromMhz: number; toMhz: number }[] {
  const ranges = band.ranges ?? [];
  const tx = ranges.filter((r) => r.role === 'uplink' || r.role === 'tdd' || r.role === 'transmit-receive');
  return tx.length > 0 ? tx : ranges;
}

/** Channels as stored (edges in MHz), or null for "the whole band"; call after radioProblems found none. */
export function storedChannels(channels: ChannelInput[] | null | undefined): { fromMhz: number; toMhz: number }[] | null {
  if (!channels || channels.length === 0) return null;
  return channels.map((c) => channelEdges(c) as { fromMhz: number; toMhz: number });
}

function channelProblems(choice: RadioBandChoice, band: KnownBand, i: number, receiveOnly: boolean): FieldProblem[] {
  const channels = choice.channels;
  if (!channels || channels.length === 0) return [];
  if (receiveOnly) return [{ field: `bands.${i}.channels`, message: 'a receive-only radio transmits on no channel; leave it empty' }];
  const tx = transmitRangesOf(band);
  const where = tx.map((r) => `${r.fromMhz}–${r.toMhz} MHz`).join(', ');
  return channels.flatMap((channel, j) => {
    const field = `bands.${i}.channels.${j}`;
    const edges = channelEdges(channel);
    if ('problem' in edges) return [{ field, message: edges.problem }];
    if (!tx.some((r) => r.fromMhz <= edges.fromMhz && edges.toMhz <= r.toMhz))
      return [{ field, message: `${edges.fromMhz}–${edges.toMhz} MHz lies outside the transmit ranges of ${band.designation} (${where})` }];
    return [];
  });
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
  if (draft.technology !== 'gnss' && draft.gnssBandwidth !== null && draft.gnssBandwidth !== undefined) {
    problems.push({ field: 'gnssBandwidth', message: `applies only to GNSS radios, not a ${draft.technology} radio; leave it empty` });
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
    problems.push(...channelProblems(choice, band, i, receiveOnly));
  });
  return problems;
}
