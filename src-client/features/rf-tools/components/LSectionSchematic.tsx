import { Tag } from '@blueprintjs/core';
import type { MatchingElement } from '../types';
import { significant } from './format';

export interface LSectionSchematicProps {
  /** Exact elements, load-side first (as the API returns them). */
  exact: MatchingElement[];
  /** The same elements snapped to the preferred series, in the same order. */
  snapped: MatchingElement[];
  series: string;
  z0Ohms: number;
  loadLabel: string;
}

function valueOf(element: MatchingElement): string {
  if (element.kind === 'inductor') return `${significant(element.inductanceNh!, 4)}\u202fnH`;
  if (element.kind === 'capacitor') return `${significant(element.capacitancePf!, 4)}\u202fpF`;
  return element.connection === 'series' ? 'short (0 Ω)' : 'open (none)';
}

const KIND_LETTER: Record<MatchingElement['kind'], string> = { inductor: 'L', capacitor: 'C', none: '—' };

function ElementBlock({ exact, snapped, series }: { exact: MatchingElement; snapped: MatchingElement; series: string }) {
  const title = `${exact.connection === 'series' ? 'Series' : 'Shunt'} ${KIND_LETTER[exact.kind]}`;
  return (
    <div className={`bw-lsec__part bw-lsec__part--${exact.connection}`} aria-label={`${title}, ${exact.position}`}>
      <div className="bw-lsec__part-title">{title}</div>
      <div className="bw-lsec__part-value">{valueOf(exact)}</div>
      {exact.kind !== 'none' && (
        <div className="bw-lsec__part-snap">
          {series}: <strong>{valueOf(snapped)}</strong>
        </div>
      )}
    </div>
  );
}

/**
 * Our own small drawing of an L-section: the source on the left, the load on the right, series parts
 * sitting on the line and shunt parts hanging from it to ground.
 */
export function LSectionSchematic({ exact, snapped, series, z0Ohms, loadLabel }: LSectionSchematicProps) {
  // The API lists the load side first; the drawing reads from the source.
  const order = exact.map((_, i) => exact.length - 1 - i);
  return (
    <div className="bw-lsec" role="group" aria-label="L-section schematic, source on the left">
      <div className="bw-lsec__end">
        <Tag minimal>Source</Tag>
        <div className="bw-lsec__end-value">Z0 {significant(z0Ohms, 4)}&nbsp;Ω</div>
      </div>
      {order.map((i) => (
        <div key={i} className="bw-lsec__slot">
          <div className="bw-lsec__wire" />
          {exact[i].connection === 'series' ? (
            <ElementBlock exact={exact[i]} snapped={snapped[i] ?? exact[i]} series={series} />
          ) : (
            <div className="bw-lsec__shunt">
              <div className="bw-lsec__node" />
              <div className="bw-lsec__drop" />
              <ElementBlock exact={exact[i]} snapped={snapped[i] ?? exact[i]} series={series} />
              <div className="bw-lsec__ground" aria-hidden="true">
                ⏚
              </div>
            </div>
          )}
          <div className="bw-lsec__wire" />
        </div>
      ))}
      <div className="bw-lsec__end">
        <Tag minimal>Load</Tag>
        <div className="bw-lsec__end-value">{loadLabel}</div>
      </div>
    </div>
  );
}
