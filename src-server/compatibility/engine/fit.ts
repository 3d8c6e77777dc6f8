import { polarizationLossDb, type Polarization } from '../../rf/link-budget';

/** How a part's feed meets the radio's: the same feed, a coaxial adapter or cable, or a change to the board. */
export type FeedFit = 'direct' | 'adapter' | 'board-change';

/** How a part's polarization meets the one the radio needs. */
export type PolarizationFit = 'matched' | 'loss' | 'opposite' | 'unknown';

const BOARD_FEED = 'solder-pad';

/**
 * The same connector fits directly; two coaxial connectors (SMA, RP-SMA, N, MMCX, MCX, micro-coax) meet through
 * an adapter or a cable; a solder-pad feed against a connector means a change to the board (common practice).
 */
export function feedFit(radioConnector: string, partConnector: string): FeedFit {
  if (radioConnector === partConnector) return 'direct';
  if (radioConnector === BOARD_FEED || partConnector === BOARD_FEED) return 'board-change';
  return 'adapter';
}

/** Linear against circular loses about 3 dB; the opposite circular sense far more (Balanis §2.12). */
const CROSS_SENSE_DB = 3.1;

export function polarizationFit(required: Polarization | null, part: Polarization | null): PolarizationFit {
  if (required === null) return 'matched';
  if (part === null) return 'unknown';
  const loss = polarizationLossDb(part, required);
  if (loss <= 1e-9) return 'matched';
  return loss <= CROSS_SENSE_DB ? 'loss' : 'opposite';
}

const FEED_RANK: Record<FeedFit, number> = { direct: 0, adapter: 1, 'board-change': 2 };
const POLARIZATION_RANK: Record<PolarizationFit, number> = { matched: 0, unknown: 1, loss: 1, opposite: 2 };

/** 0 for a part that fits the radio's feed and polarization; each step away adds one. */
export function fitRank(feed: FeedFit, polarization: PolarizationFit): number {
  return FEED_RANK[feed] + POLARIZATION_RANK[polarization];
}
