import { useMemo } from 'react';
import { useQuery } from '@tanstack/react-query';
import { getBandsQueryOptions } from '../../../api/bands';
import type { components } from '../../../lib/api-types';
import type { OverlayBand } from '../types';

type Band = components['schemas']['BandDto'];
type BandRange = components['schemas']['BandRangeDto'];

/** Of a library band, what an overlay needs. */
type LibraryBand = Pick<Band, 'id' | 'designation'> & { ranges: Pick<BandRange, 'fromMhz' | 'toMhz'>[] };

/**
 * The short built-in list, used when the band library cannot be read.
 * Edges: 3GPP TS 36.101 Table 5.5-1 (B3, B8, B20); IS-GPS-200 (L1 ± 10.23 MHz); LoRa Alliance RP002 (EU868, US915);
 * 47 CFR 15.247 (2.4 GHz ISM); 5 GHz Wi-Fi channels 36–165 from IEEE 802.11-2020.
 */
export const BUILT_IN_BANDS: OverlayBand[] = [
  { key: 'b20', label: 'LTE B20', fromHz: 791e6, toHz: 862e6 },
  { key: 'eu868', label: 'EU868', fromHz: 863e6, toHz: 870e6 },
  { key: 'b8', label: 'LTE B8', fromHz: 880e6, toHz: 960e6 },
  { key: 'us915', label: 'US915', fromHz: 902e6, toHz: 928e6 },
  { key: 'gnss-l1', label: 'GNSS L1', fromHz: 1565.19e6, toHz: 1585.65e6 },
  { key: 'b3', label: 'LTE B3', fromHz: 1710e6, toHz: 1880e6 },
  { key: 'ism-2g4', label: '2.4 GHz ISM', fromHz: 2400e6, toHz: 2483.5e6 },
  { key: 'wifi-5g', label: '5 GHz Wi-Fi', fromHz: 5170e6, toHz: 5835e6 },
];

/** A library band as one overlay spanning all its ranges (uplink to downlink). */
export function overlayFromLibrary(band: LibraryBand): OverlayBand | null {
  if (band.ranges.length === 0) return null;
  const fromMhz = Math.min(...band.ranges.map((r) => r.fromMhz));
  const toMhz = Math.max(...band.ranges.map((r) => r.toMhz));
  return { key: `band-${band.id}`, label: band.designation, fromHz: fromMhz * 1e6, toHz: toMhz * 1e6 };
}

/** The library's bands as overlays, lowest first; an empty or unreadable library gives the built-in list. */
export function overlaysFromLibrary(library: LibraryBand[] | undefined): { bands: OverlayBand[]; fromLibrary: boolean } {
  const bands = (library ?? []).map(overlayFromLibrary).filter((b): b is OverlayBand => b !== null);
  return bands.length ? { bands: bands.sort((a, b) => a.fromHz - b.fromHz), fromLibrary: true } : { bands: BUILT_IN_BANDS, fromLibrary: false };
}

/** The same cache the band pages use; undefined only during the first attempt to load it (a failure falls back at once). */
export function useOverlayBands() {
  const library = useQuery(getBandsQueryOptions());
  const loading = library.data === undefined && library.isFetching && library.failureCount === 0;
  const data = useMemo(() => (loading ? undefined : overlaysFromLibrary(library.data)), [loading, library.data]);
  return { data };
}
