import { Button, Callout, Drawer, DrawerSize, Intent, Tag } from '@blueprintjs/core';
import { FrequencyChart } from '../../../components/FrequencyChart';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { usePoints } from '../api/get-measurement-points';
import { usePartMeasurements } from '../api/get-part-measurements';
import type { Finding, Matrix, MatrixCell, MatrixRow, MeasurementPoints } from '../types';
import { STATUS_LOOK } from './cell-status';

export interface MatrixCellDrawerProps {
  matrix: Matrix;
  /** The cell to explain; null keeps the drawer closed. */
  cell: MatrixCell | null;
  onClose: () => void;
  onFindCandidates: (radioId: number) => void;
}

const FINDING_INTENT: Record<Finding['severity'], Intent> = {
  fail: STATUS_LOOK.fail.intent,
  marginal: STATUS_LOOK.marginal.intent,
  'no-data': STATUS_LOOK['no-data'].intent,
  info: Intent.PRIMARY,
};

/** Why a cell has its state: the findings with their numbers, and the part's curves over the band. */
export function MatrixCellDrawer({ matrix, cell, onClose, onFindCandidates }: MatrixCellDrawerProps) {
  const row = cell ? matrix.rows[cell.row] : null;
  const column = cell ? matrix.columns[cell.column] : null;
  const look = cell ? STATUS_LOOK[cell.status] : null;
  return (
    <Drawer
      isOpen={cell !== null}
      onClose={onClose}
      size={DrawerSize.STANDARD}
      icon={look?.icon}
      title={row && column ? `${row.designation} (${row.radioName}) × ${column.mpn}` : ''}
    >
      {cell && row && column && look && (
        <div className="bp6-drawer-body" style={{ padding: 16 }} data-testid="cell-detail">
          <p>
            <Tag intent={look.intent} icon={look.icon} large>
              {look.label}
            </Tag>{' '}
            {column.manufacturer} {column.title}; band {row.ranges.map((r) => `${r.fromMhz}–${r.toMhz} MHz ${r.role}`).join(', ')}
          </p>
          {cell.findings.length === 0 && (
            <Callout intent={Intent.SUCCESS} icon="tick-circle">
              Every rule that applies is met.
            </Callout>
          )}
          {cell.findings.map((f) => (
            <Callout key={f.ruleId + f.code} intent={FINDING_INTENT[f.severity]} className="bw-matrix__finding" title={f.title} data-testid="finding">
              {f.message}
            </Callout>
          ))}
          <BandCurves partId={column.partId} row={row} />
          <ScreeningCaution compact />
          <Button icon="search" intent={Intent.PRIMARY} text={`Find candidates for ${row.radioName}`} onClick={() => onFindCandidates(row.radioId)} />
        </div>
      )}
    </Drawer>
  );
}

interface BandCurvesProps {
  partId: number;
  row: MatrixRow;
}

/** The part's measured VSWR and efficiency around the band, with the band shaded. */
function BandCurves({ partId, row }: BandCurvesProps) {
  const part = usePartMeasurements(partId);
  const current = (kind: string) => part.data?.measurements.find((m) => m.kind === kind && m.current)?.id;
  const s11 = usePoints(part.data ? partId : null, current('s11'));
  const efficiency = usePoints(part.data ? partId : null, current('efficiency'));
  const lowHz = Math.min(...row.ranges.map((r) => r.fromMhz)) * 1e6;
  const highHz = Math.max(...row.ranges.map((r) => r.toMhz)) * 1e6;
  const span = Math.max(highHz - lowHz, lowHz * 0.02);
  const window = { fromHz: lowHz - span * 0.6, toHz: highHz + span * 0.6 };
  const bands = row.ranges.map((r) => ({ fromHz: r.fromMhz * 1e6, toHz: r.toMhz * 1e6, label: `${row.designation} ${r.role}` }));
  if (part.isPending) return null;
  if (!current('s11') && !current('efficiency'))
    return (
      <Callout icon="info-sign" className="bw-matrix__finding">
        No measured curves: this part is judged from its datasheet spec bands.
      </Callout>
    );
  return (
    <>
      {s11.data?.vswr && (
        <Curve
          title="VSWR over the band"
          points={s11.data}
          values={s11.data.vswr}
          unit=""
          label="VSWR"
          window={window}
          ranges={bands}
          threshold={{ value: 2, unit: '', label: 'VSWR 2' }}
        />
      )}
      {efficiency.data && (
        <Curve
          title="Radiation efficiency over the band"
          points={efficiency.data}
          values={efficiency.data.values}
          unit="%"
          label="Efficiency"
          window={window}
          ranges={bands}
        />
      )}
    </>
  );
}

interface CurveProps {
  title: string;
  points: MeasurementPoints;
  values: number[];
  unit: string;
  label: string;
  window: { fromHz: number; toHz: number };
  ranges: { fromHz: number; toHz: number; label: string }[];
  threshold?: { value: number; unit: string; label: string };
}

function Curve({ title, points, values, unit, label, window, ranges, threshold }: CurveProps) {
  const keep = points.frequenciesHz.map((f, i) => [f, values[i]] as const).filter(([f]) => f >= window.fromHz && f <= window.toHz);
  if (keep.length < 2)
    return (
      <Callout icon="info-sign" className="bw-matrix__finding">
        {title}: the measurement does not reach this band (no data).
      </Callout>
    );
  return (
    <FrequencyChart
      title={title}
      height={200}
      frequencyHz={keep.map(([f]) => f)}
      series={[{ label, unit, values: keep.map(([, v]) => v) }]}
      ranges={ranges}
      threshold={threshold}
      description={`${label} of the part around ${ranges.map((r) => r.label).join(', ')}`}
    />
  );
}
