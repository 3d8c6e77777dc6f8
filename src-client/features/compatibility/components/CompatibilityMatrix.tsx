import { useCallback, useMemo, useState } from 'react';
import { Button, ButtonGroup, H3, HTMLTable, Icon, Intent, NonIdealState, OverlayToaster, Position, Tag } from '@blueprintjs/core';
import { Cell, Column, ColumnHeaderCell, RowHeaderCell, Table } from '@blueprintjs/table';
import { QueryState } from '../../../components/QueryState';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { useDownloadMatrixCsv } from '../api/download-matrix-csv';
import { useMatrix } from '../api/get-matrix';
import type { Matrix, MatrixCell } from '../types';
import { STATUS_LOOK, decidingFinding } from './cell-status';
import { CandidatesDialog } from './CandidatesDialog';
import { MatrixCellDrawer } from './MatrixCellDrawer';
import './compatibility.css';

export interface CompatibilityMatrixProps {
  productId: number;
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** Every radio band of the product (rows) against its assigned and shortlisted parts (columns). */
export function CompatibilityMatrix({ productId }: CompatibilityMatrixProps) {
  const matrix = useMatrix(productId);
  const downloadCsv = useDownloadMatrixCsv();
  const [selected, setSelected] = useState<MatrixCell | null>(null);
  const [candidatesFor, setCandidatesFor] = useState<number | null>(null);
  const m = matrix.data;

  const cellAt = useMemo(() => {
    const index = new Map<string, MatrixCell>();
    for (const cell of m?.cells ?? []) index.set(`${cell.row}:${cell.column}`, cell);
    return (row: number, column: number) => index.get(`${row}:${column}`);
  }, [m]);

  const radios = useMemo(() => {
    const seen = new Map<number, string>();
    for (const row of m?.rows ?? []) if (!seen.has(row.radioId)) seen.set(row.radioId, row.radioName);
    return [...seen.entries()].map(([id, name]) => ({ id, name }));
  }, [m]);

  const getCellData = useCallback(
    (row: number, column: number) => {
      const cell = cellAt(row, column);
      return cell ? `${STATUS_LOOK[cell.status].label} ${cell.findings.map((f) => f.message).join('; ')}` : '';
    },
    [cellAt],
  );

  const cellRenderers = useMemo(
    () =>
      (m?.columns ?? []).map((column, c) => (row: number) => {
        const cell = cellAt(row, c);
        if (!cell || !m) return <Cell />;
        const look = STATUS_LOOK[cell.status];
        const radioId = m.rows[row].radioId;
        const assignment = column.assignments.find((a) => a.radioId === radioId);
        const finding = decidingFinding(cell);
        return (
          <Cell intent={look.intent}>
            <button
              type="button"
              className={`bw-matrix__cell${assignment ? ' bw-matrix__cell--assigned' : ''}`}
              data-testid={`cell-${radioId}-${m.rows[row].bandId}-${column.partId}`}
              data-status={cell.status}
              onClick={() => setSelected(cell)}
              title={finding?.message ?? look.label}
            >
              <Icon icon={look.icon} size={12} />
              {look.label}
              {finding && <span className="bw-matrix__code">{finding.title}</span>}
              {assignment?.state === 'chosen' && <Icon icon="star" size={10} title="chosen for this radio" />}
            </button>
          </Cell>
        );
      }),
    [m, cellAt],
  );

  const headerRenderers = useMemo(
    () =>
      (m?.columns ?? []).map((column) => () => (
        <ColumnHeaderCell
          name={column.mpn}
          nameRenderer={() => (
            <span title={`${column.manufacturer} ${column.title}`}>
              <b>{column.mpn}</b>
              <span className="bw-muted"> {column.manufacturer}</span>
            </span>
          )}
        />
      )),
    [m],
  );

  const rowHeader = useCallback(
    (row: number) => {
      const r = m?.rows[row];
      return <RowHeaderCell name={r ? `${r.designation} · ${r.radioName}` : ''} />;
    },
    [m],
  );

  return (
    <section className="bw-matrix" aria-labelledby="bw-matrix-title">
      <H3 id="bw-matrix-title">Compatibility matrix</H3>
      <QueryState isPending={matrix.isPending} error={matrix.error}>
        {m && (
          <>
            <div className="bw-matrix__toolbar bw-no-print">
              <span className="bw-matrix__legend">
                {(['pass', 'marginal', 'fail', 'no-data'] as const).map((s) => (
                  <Tag key={s} intent={STATUS_LOOK[s].intent} icon={STATUS_LOOK[s].icon} minimal={s === 'no-data'}>
                    {STATUS_LOOK[s].label}
                  </Tag>
                ))}
              </span>
              <ButtonGroup>
                {radios.map((radio) => (
                  <Button key={radio.id} icon="search" text={`Find candidates: ${radio.name}`} onClick={() => setCandidatesFor(radio.id)} />
                ))}
              </ButtonGroup>
              <Button
                icon="download"
                text="Export CSV"
                disabled={m.columns.length === 0}
                loading={downloadCsv.isPending}
                onClick={() =>
                  downloadCsv.mutate(
                    { productId, productName: m.productName },
                    { onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })) },
                  )
                }
              />
              <Button icon="print" text="Print report" onClick={() => window.print()} />
            </div>
            <ScreeningCaution compact />
            {m.columns.length === 0 ? (
              <NonIdealState
                icon="th"
                title="No parts assigned yet"
                description="Use Find candidates for a radio to shortlist or choose parts; they appear here as columns."
              />
            ) : (
              <div className="bw-matrix__table bw-screen-only" data-testid="matrix-table">
                <Table
                  numRows={m.rows.length}
                  defaultRowHeight={30}
                  columnWidths={m.columns.map(() => 230)}
                  rowHeaderCellRenderer={rowHeader}
                  getCellClipboardData={getCellData}
                >
                  {m.columns.map((column, c) => (
                    <Column key={column.partId} id={`part-${column.partId}`} cellRenderer={cellRenderers[c]} columnHeaderCellRenderer={headerRenderers[c]} />
                  ))}
                </Table>
              </div>
            )}
            <MatrixReport matrix={m} />
            <MatrixCellDrawer
              matrix={m}
              cell={selected}
              onClose={() => setSelected(null)}
              onFindCandidates={(radioId) => {
                setSelected(null);
                setCandidatesFor(radioId);
              }}
            />
            <CandidatesDialog productId={productId} radioId={candidatesFor} onClose={() => setCandidatesFor(null)} />
          </>
        )}
      </QueryState>
    </section>
  );
}

interface MatrixReportProps {
  matrix: Matrix;
}

/** The printed form: every cell with its findings, under the full caution. */
function MatrixReport({ matrix }: MatrixReportProps) {
  return (
    <div className="bw-print-only bw-matrix__report">
      <h2>Compatibility report: {matrix.productName}</h2>
      <ScreeningCaution />
      <HTMLTable compact bordered>
        <thead>
          <tr>
            <th>Radio band</th>
            <th>Part</th>
            <th>Status</th>
            <th>Findings</th>
          </tr>
        </thead>
        <tbody>
          {matrix.cells.map((cell) => {
            const row = matrix.rows[cell.row];
            const column = matrix.columns[cell.column];
            return (
              <tr key={`${cell.row}:${cell.column}`}>
                <td>
                  {row.designation} · {row.radioName}
                </td>
                <td>
                  {column.mpn} ({column.manufacturer})
                </td>
                <td>{STATUS_LOOK[cell.status].label}</td>
                <td>
                  {cell.findings.map((f) => (
                    <div key={f.ruleId + f.code}>
                      {f.severity}: {f.message}
                    </div>
                  ))}
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
      <p>Rules: {matrix.rules}</p>
    </div>
  );
}
