import { Icon, Intent, Tag } from '@blueprintjs/core';
import type { PartConsistency } from '../types';
import { MISSING_LABEL, claimLines, directivityText } from './review-aid';
import './review-offers.css';

const AGREES_ICON = { true: 'tick-circle', false: 'error', null: 'minus' } as const;
const AGREES_INTENT = { true: Intent.SUCCESS, false: Intent.DANGER, null: Intent.NONE } as const;
const AGREES_LABEL = { true: 'agrees', false: 'disagrees', null: 'not compared' } as const;

/** A part's datasheet claims against its measurements, what it lacks, and the directivity its figures imply. */
export function ReviewAid({ check, compact = false }: { check: PartConsistency; compact?: boolean }) {
  return (
    <div className="bw-review-aid" data-testid="review-aid">
      {check.missing.length > 0 && (
        <div className="bw-tags" data-testid="review-missing">
          {check.missing.map((m) => (
            <Tag key={m} minimal intent={Intent.WARNING} icon="warning-sign">
              {MISSING_LABEL[m]}
            </Tag>
          ))}
        </div>
      )}
      {check.bands.length > 0 && (
        <ul className="bw-review-aid__lines">
          {check.bands.flatMap((b, i) => {
            const lines = claimLines(b).map((line) => {
              const key = String(line.agrees) as 'true' | 'false' | 'null';
              return (
                <li key={`${i}-${line.quantity}`} data-agrees={key}>
                  <Icon icon={AGREES_ICON[key]} intent={AGREES_INTENT[key]} size={14} title={AGREES_LABEL[key]} />
                  <span>{line.text}</span>
                </li>
              );
            });
            const d = directivityText(b, check.plausibleMaxDirectivityDbi);
            if (d)
              lines.push(
                <li key={`${i}-directivity`} data-testid="implied-directivity" data-verdict={b.directivity?.verdict}>
                  <Icon icon={d.intent === Intent.SUCCESS ? 'tick-circle' : 'error'} intent={d.intent} size={14} />
                  <span>
                    {compact ? '' : `${b.fromMhz}–${b.toMhz} MHz: `}
                    {d.text}
                  </span>
                </li>,
              );
            return lines;
          })}
        </ul>
      )}
      {check.bands.length === 0 && check.missing.length === 0 && <p className="bw-muted">Nothing to compare.</p>}
    </div>
  );
}
