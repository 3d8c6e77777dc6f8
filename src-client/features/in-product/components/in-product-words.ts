import { ANTENNA_ROLE_LABELS } from '../../../lib/antenna-role-labels';
import type { AntennaRole, InProductMeasurement } from '../types';

/** A frequency in MHz as the product page writes it: at most three decimals, no trailing zeros. */
export const mhzText = (mhz: number): string => String(Number(mhz.toFixed(3)));

/** "600–6000 MHz" */
export const frequencySpanText = (m: Pick<InProductMeasurement, 'fromMhz' | 'toMhz'>): string => `${mhzText(m.fromMhz)}–${mhzText(m.toMhz)}\u00a0MHz`;

/** "diversity (port 2)": which antenna of its radio, and the port of the file it was measured on. */
export const roleAndPortText = (a: { role: AntennaRole; port: number }): string => `${ANTENNA_ROLE_LABELS[a.role]} (port\u00a0${a.port})`;

/** "Cellular LTE Cat-1 · diversity (port 2)" */
export const antennaLabel = (a: { radioName: string; role: AntennaRole; port: number }): string => `${a.radioName} · ${roleAndPortText(a)}`;

/** Isolation in dB, one decimal, with its unit; null where the file has no points in the bands. */
export const isolationText = (db: number | null): string => (db === null ? 'no points in these bands' : `${db.toFixed(1)}\u00a0dB`);

/** An envelope correlation coefficient (0 to 1): three decimals, so the small values of good antennas still read. */
export const eccText = (ecc: number | null): string => (ecc === null ? 'no points in this band' : ecc < 0.0005 ? '< 0.001' : ecc.toFixed(3));

/** "541 points, 4 ports" and similar counts with their nouns. */
export const countText = (n: number, one: string, many: string): string => `${n.toLocaleString('en')} ${n === 1 ? one : many}`;

/** The mapped ports of a file in words, one per port: "Port 1: Cellular LTE Cat-1 · main". */
export const mappingLines = (m: Pick<InProductMeasurement, 'portMapping'>): string[] =>
  m.portMapping.map((p) => `Port ${p.port}: ${p.radioName || 'a removed radio'} · ${ANTENNA_ROLE_LABELS[p.role]}`);

/**
 * A refused upload in one sentence: the server's message without its "file:" field prefix, starting with a capital,
 * and saying that nothing was stored (the server refuses a whole file or stores it whole).
 */
export function uploadRefusalText(message: string): string {
  const text = message.replace(/^file:\s*/i, '').trim();
  const capital = text.charAt(0).toUpperCase() + text.slice(1);
  const stop = /[.!?]$/.test(capital) ? capital : `${capital}.`;
  return /nothing was stored/i.test(stop) ? stop.replace(/; nothing was stored\.$/i, '. Nothing was stored.') : `${stop} Nothing was stored.`;
}
