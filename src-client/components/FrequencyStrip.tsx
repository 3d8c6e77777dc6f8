import { type RefObject, useEffect, useId, useMemo, useRef, useState } from 'react';
import { Classes } from '@blueprintjs/core';
import type { components } from '../lib/api-types';
import { type FrequencyAxis, formatMhz, logAxis, mergeIntervals, piecewiseAxis } from './frequency-axis';
import './FrequencyStrip.css';

/** The role of a required range; each role has its own fill pattern, not only its own shade. */
export type StripRole = components['schemas']['RangeRole'];

export interface StripRange {
  fromMhz: number;
  toMhz: number;
  role: StripRole;
  /** Short name drawn inside the bar when it fits, e.g. "B12". */
  label: string;
}

/** A second layer: what a part covers (drawn as a band under the required ranges of its row). */
export interface StripCoveredRange {
  fromMhz: number;
  toMhz: number;
  /** Who covers it, e.g. a part number; used in the hover title. */
  label: string;
}

export interface StripRow {
  id: string | number;
  /** Row heading, e.g. the radio's name. */
  label: string;
  ranges: StripRange[];
  /** Optional covered ranges of a candidate or assigned part. @default [] */
  covered?: StripCoveredRange[];
}

export interface FrequencyStripProps {
  rows: StripRow[];
  /** 'piecewise' squeezes the empty gaps between clusters; 'log' is one continuous log axis. @default 'piecewise' */
  scale?: 'piecewise' | 'log';
  /** Accessible name of the drawing. @default 'Required frequency ranges' */
  title?: string;
  /** Shows the legend of patterns under the strip. @default true */
  legend?: boolean;
}

const ROLE_TEXT: Record<StripRole, string> = {
  uplink: 'Uplink (device transmits)',
  downlink: 'Downlink (device receives)',
  tdd: 'TDD (shared, time-divided)',
  receive: 'Receive only',
  'transmit-receive': 'Shared transmit/receive channel',
};
const ROLES = Object.keys(ROLE_TEXT) as StripRole[];

const LABEL_W = 170;
const ROW_H = 34;
const BAR_H = 18;
const COVER_H = 5;
const AXIS_H = 26;
const RIGHT_PAD = 16;

function useWidth(fallback: number): [RefObject<HTMLElement | null>, number] {
  const ref = useRef<HTMLElement>(null);
  const [width, setWidth] = useState(fallback);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => entry.contentRect.width > 0 && setWidth(entry.contentRect.width));
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return [ref, width];
}

/** The hatch, dot and stripe patterns of the roles; ids are made unique per strip. */
function RolePatterns({ prefix }: { prefix: string }) {
  return (
    <defs>
      <pattern id={`${prefix}-uplink`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width="6" height="6" className="bw-strip__fill bw-strip__fill--uplink" />
        <line x1="0" y1="0" x2="0" y2="6" className="bw-strip__ink" strokeWidth="2.4" />
      </pattern>
      <pattern id={`${prefix}-downlink`} width="6" height="6" patternUnits="userSpaceOnUse">
        <rect width="6" height="6" className="bw-strip__fill bw-strip__fill--downlink" />
      </pattern>
      <pattern id={`${prefix}-tdd`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width="6" height="6" className="bw-strip__fill bw-strip__fill--tdd" />
        <line x1="0" y1="0" x2="0" y2="6" className="bw-strip__ink" strokeWidth="1.4" />
        <line x1="0" y1="0" x2="6" y2="0" className="bw-strip__ink" strokeWidth="1.4" />
      </pattern>
      <pattern id={`${prefix}-receive`} width="5" height="5" patternUnits="userSpaceOnUse">
        <rect width="5" height="5" className="bw-strip__fill bw-strip__fill--receive" />
        <circle cx="2.5" cy="2.5" r="1.1" className="bw-strip__dot" />
      </pattern>
      <pattern id={`${prefix}-transmit-receive`} width="6" height="6" patternUnits="userSpaceOnUse">
        <rect width="6" height="6" className="bw-strip__fill bw-strip__fill--shared" />
        <line x1="0" y1="3" x2="6" y2="3" className="bw-strip__ink" strokeWidth="1.6" />
      </pattern>
    </defs>
  );
}

const LANE_H = 20;

/** Puts each bar in the first lane where it clears the previous bar, so overlapping bands stack instead of hiding each other. */
function packLanes(spans: { x0: number; x1: number }[]): { lanes: number[]; count: number } {
  const ends: number[] = [];
  const order = spans.map((s, i) => i).sort((a, b) => spans[a].x0 - spans[b].x0);
  const lanes = new Array<number>(spans.length).fill(0);
  for (const i of order) {
    let lane = ends.findIndex((end) => spans[i].x0 >= end + 1);
    if (lane === -1) {
      lane = ends.length;
      ends.push(0);
    }
    ends[lane] = spans[i].x1;
    lanes[i] = lane;
  }
  return { lanes, count: Math.max(ends.length, 1) };
}

const rangeTitle = (row: string, r: StripRange) => `${row}: ${r.label} ${ROLE_TEXT[r.role].toLowerCase()}, ${formatMhz(r.fromMhz)} – ${formatMhz(r.toMhz)}`;

/**
 * Bandwright's band-plan strip: one row per radio, its required ranges drawn on a shared
 * frequency axis, uplink/downlink/TDD/receive told apart by pattern; an optional covered layer per row.
 */
export function FrequencyStrip({ rows, scale = 'piecewise', title = 'Required frequency ranges', legend = true }: FrequencyStripProps) {
  const prefix = `bw-strip-${useId().replace(/[^a-z0-9]/gi, '')}`;
  const [ref, width] = useWidth(900);
  const plotWidth = Math.max(width - LABEL_W - RIGHT_PAD, 120);
  const all = useMemo(() => rows.flatMap((r) => [...r.ranges, ...(r.covered ?? [])]), [rows]);
  const axis: FrequencyAxis = useMemo(() => {
    if (!all.length) return logAxis(100, 10000, plotWidth);
    if (scale === 'log') {
      const merged = mergeIntervals(all);
      return logAxis(merged[0].fromMhz * 0.9, merged[merged.length - 1].toMhz * 1.1, plotWidth);
    }
    return piecewiseAxis(all, plotWidth);
  }, [all, scale, plotWidth]);
  const layout = useMemo(() => {
    let y = 0;
    return rows.map((row) => {
      const spans = row.ranges.map((r) => ({ x0: axis.x(r.fromMhz), x1: Math.max(axis.x(r.toMhz), axis.x(r.fromMhz) + 2) }));
      const { lanes, count } = packLanes(spans);
      const height = Math.max(ROW_H, count * LANE_H + 14);
      const entry = { y, height, spans, lanes };
      y += height;
      return entry;
    });
  }, [rows, axis]);
  const plotHeight = layout.reduce((sum, l) => sum + l.height, 0);
  const height = plotHeight + AXIS_H + 6;
  const presentRoles = ROLES.filter((role) => rows.some((r) => r.ranges.some((x) => x.role === role)));
  const hasCovered = rows.some((r) => (r.covered ?? []).length > 0);

  return (
    <figure className="bw-strip" ref={ref}>
      <svg width="100%" height={height} role="img" aria-label={title} data-testid="frequency-strip">
        <title>{title}</title>
        <RolePatterns prefix={prefix} />
        <g transform={`translate(${LABEL_W}, 0)`}>
          {axis.ticks.map((t) => (
            <g key={t.mhz} transform={`translate(${t.x}, 0)`} className="bw-strip__tick">
              <line y1={0} y2={plotHeight} className="bw-strip__grid" />
              <text y={plotHeight + 16} textAnchor="middle" className="bw-strip__tick-label">
                {t.label}
              </text>
            </g>
          ))}
          {axis.breaks.map((x) => (
            <g key={x} className="bw-strip__break" data-testid="axis-break">
              <line x1={x - 3} x2={x + 3} y1={plotHeight + 4} y2={plotHeight - 4} />
              <line x1={x + 1} x2={x + 7} y1={plotHeight + 4} y2={plotHeight - 4} />
            </g>
          ))}
        </g>
        {rows.map((row, i) => {
          const { y, height: rowHeight, spans, lanes } = layout[i];
          return (
            <g key={row.id} transform={`translate(0, ${y})`} data-testid="strip-row">
              {i > 0 && <line x1={0} x2={width} y1={0} y2={0} className="bw-strip__row-rule" />}
              <text x={4} y={rowHeight / 2 + 4} className="bw-strip__row-label">
                {row.label}
              </text>
              <g transform={`translate(${LABEL_W}, 0)`}>
                {row.ranges.map((r, j) => {
                  const { x0, x1 } = spans[j];
                  const w = x1 - x0;
                  const top = 4 + lanes[j] * LANE_H;
                  const fits = w > r.label.length * 6.5 + 6;
                  return (
                    <g key={`${r.label}-${r.role}-${j}`} data-role={r.role}>
                      <title>{rangeTitle(row.label, r)}</title>
                      <rect x={x0} y={top} width={w} height={BAR_H - 2} rx={2} fill={`url(#${prefix}-${r.role})`} className="bw-strip__bar" />
                      {fits && (
                        <text x={x0 + w / 2} y={top + BAR_H / 2 + 2} textAnchor="middle" className="bw-strip__bar-label">
                          {r.label}
                        </text>
                      )}
                    </g>
                  );
                })}
                {(row.covered ?? []).map((c, j) => {
                  const x0 = axis.x(c.fromMhz);
                  return (
                    <rect
                      key={`cover-${j}`}
                      x={x0}
                      y={rowHeight - COVER_H - 3}
                      width={Math.max(axis.x(c.toMhz) - x0, 2)}
                      height={COVER_H}
                      className="bw-strip__covered"
                      data-testid="covered-range"
                    >
                      <title>{`${c.label} covers ${formatMhz(c.fromMhz)} – ${formatMhz(c.toMhz)}`}</title>
                    </rect>
                  );
                })}
              </g>
            </g>
          );
        })}
      </svg>
      {legend && (presentRoles.length > 0 || hasCovered) && (
        <figcaption className={`bw-strip__legend ${Classes.TEXT_SMALL}`}>
          {presentRoles.map((role) => (
            <span key={role} className="bw-strip__legend-item">
              <svg width="22" height="12" aria-hidden="true">
                <rect width="22" height="12" rx="2" fill={`url(#${prefix}-${role})`} className="bw-strip__bar" />
              </svg>
              {ROLE_TEXT[role]}
            </span>
          ))}
          {hasCovered && (
            <span className="bw-strip__legend-item">
              <svg width="22" height="12" aria-hidden="true">
                <rect y="4" width="22" height="5" className="bw-strip__covered" />
              </svg>
              Covered by the part
            </span>
          )}
          {scale === 'piecewise' && axis.breaks.length > 0 && (
            <span className={`bw-strip__legend-item ${Classes.TEXT_MUTED}`}>Log axis; empty stretches between groups are shortened (≈).</span>
          )}
        </figcaption>
      )}
    </figure>
  );
}
