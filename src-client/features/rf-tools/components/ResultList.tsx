import type { ReactNode } from 'react';

export interface ResultListProps {
  /** Label → value pairs, shown in order. */
  rows: Array<[string, ReactNode]>;
}

/** A compact two-column list of computed figures. */
export function ResultList({ rows }: ResultListProps) {
  return (
    <dl className="bw-results">
      {rows.map(([label, value]) => (
        <div key={label} className="bw-results__row">
          <dt>{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
