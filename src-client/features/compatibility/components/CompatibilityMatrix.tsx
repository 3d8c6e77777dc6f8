import { useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Button, H3, H4, HTMLTable, Icon, Intent, NonIdealState, OverlayToaster, Position, Switch, Tag } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import type { AntennaRole } from '../../../lib/antenna-role-labels';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { VERDICTS } from '../../../components/verdict-look';
import { useDownloadMatrixCsv } from '../api/download-matrix-csv';
import { useMatrix } from '../api/get-matrix';
import type { Finding, Matrix, MatrixCell } from '../types';
import { STATUS_LOOK, decidingFinding } from './cell-status';
import { CandidatesDialog } from './CandidatesDialog';
import { CANDIDATE_PARAMS, withoutCandidateParams } from './candidate-words';
import { MatrixCellDrawer } from './MatrixCellDrawer';
import { type RadioMatrix, matrixByRadio } from './matrix-layout';
import './compatibility.css';

export interface CompatibilityMatrixProps {
  productId: number;
  /** Each radio's antennas (main, diversity, MIMO …) by radio id, so a part can be chosen for one of them. @default main only */
  antennaRoles?: Readonly<Record<number, readonly AntennaRole[]>>;
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** The page URL's switch for the chosen parts only view, so it survives a reload and Back. */
export const CHOSEN_ONLY_PARAM = 'parts';

/** Each radio's bands (rows) against that radio's own chosen and shortlisted parts (columns). */
export function CompatibilityMatrix({ productId, antennaRoles }: CompatibilityMatrixProps) {
  const [searchParams, setSearchParams] = useSearchParams();
  const chosenOnly = searchParams.get(CHOSEN_ONLY_PARAM) === 'chosen';
  const matrix = useMatrix(productId, chosenOnly);
  const downloadCsv = useDownloadMatrixCsv();
  const [selected, setSelected] = useState<MatrixCell | null>(null);
  // The radio whose candidates are open is in the address too (its filters are kept there by the dialog).
  const candidatesParam = Number(searchParams.get(CANDIDATE_PARAMS.radio));
  const candidatesFor = Number.isInteger(candidatesParam) && candidatesParam > 0 ? candidatesParam : null;
  const setCandidatesFor = (radioId: number | null) =>
    setSearchParams((current) => {
      if (radioId === null) return withoutCandidateParams(current);
      const next = new URLSearchParams(current);
      next.set(CANDIDATE_PARAMS.radio, String(radioId));
      return next;
    });
  const m = matrix.data;
  const radios = useMemo(() => (m ? matrixByRadio(m) : []), [m]);

  const setChosenOnly = (on: boolean) =>
    setSearchParams((params) => {
      const next = new URLSearchParams(params);
      if (on) next.set(CHOSEN_ONLY_PARAM, 'chosen');
      else next.delete(CHOSEN_ONLY_PARAM);
      return next;
    });

  return (
    <section className="bw-matrix" aria-labelledby="bw-matrix-title">
      <H3 id="bw-matrix-title">Compatibility matrix</H3>
      <div className="bw-matrix__toolbar bw-no-print">
        <span className="bw-matrix__legend">
          {VERDICTS.map((s) => (
            <Tag key={s} intent={STATUS_LOOK[s].intent} icon={STATUS_LOOK[s].icon} minimal={s === 'no-data'}>
              {STATUS_LOOK[s].label}
            </Tag>
          ))}
        </span>
        <Switch
          className="bw-matrix__switch"
          label="Chosen parts only"
          checked={chosenOnly}
          onChange={(e) => setChosenOnly(e.currentTarget.checked)}
          data-testid="chosen-only"
        />
        <Button
          icon="download"
          text="Export CSV"
          disabled={!m || m.columns.length === 0}
          loading={downloadCsv.isPending}
          onClick={() =>
            m &&
            downloadCsv.mutate(
              { productId, productName: m.productName },
              { onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })) },
            )
          }
        />
        <Button icon="print" text="Print page" onClick={() => window.print()} />
      </div>
      {/* The product page shows the compact caution right above this section; the printout carries the full one. */}
      <QueryState isPending={matrix.isPending} error={matrix.error}>
        {m && (
          <>
            {m.rows.length === 0 && <NonIdealState icon="th" title="No radio bands yet" description="Add radios with their bands above." />}
            <div className="bw-screen-only" data-testid="matrix-table">
              {radios.map((radio) => (
                <RadioTable
                  key={radio.radioId}
                  radio={radio}
                  radioFindings={m.radios.find((r) => r.radioId === radio.radioId)?.findings ?? []}
                  chosenOnly={chosenOnly}
                  onSelect={setSelected}
                  onFindCandidates={() => setCandidatesFor(radio.radioId)}
                />
              ))}
            </div>
            <MatrixPrintout matrix={m} />
            <MatrixCellDrawer
              matrix={m}
              cell={selected}
              onClose={() => setSelected(null)}
              onFindCandidates={(radioId) => {
                setSelected(null);
                setCandidatesFor(radioId);
              }}
            />
          </>
        )}
      </QueryState>
      <CandidatesDialog
        productId={productId}
        radioId={candidatesFor}
        antennaRoles={candidatesFor === null ? undefined : antennaRoles?.[candidatesFor]}
        onClose={() => setCandidatesFor(null)}
      />
    </section>
  );
}

interface RadioTableProps {
  radio: RadioMatrix;
  /** Findings about the radio as a whole, e.g. a target market none of its bands is used in. */
  radioFindings: Finding[];
  chosenOnly: boolean;
  onSelect: (cell: MatrixCell) => void;
  onFindCandidates: () => void;
}

/** One radio's bands against its own parts; the text of a cell wraps rather than being cut. */
function RadioTable({ radio, radioFindings, chosenOnly, onSelect, onFindCandidates }: RadioTableProps) {
  return (
    <div className="bw-matrix__radio" data-testid={`matrix-radio-${radio.radioId}`}>
      <div className="bw-matrix__radio-head">
        <H4>{radio.radioName}</H4>
        <Button className="bw-no-print" small icon="search" text={`Find candidates: ${radio.radioName}`} onClick={onFindCandidates} />
      </div>
      {radioFindings.map((finding) => (
        <p key={`${finding.code}-${finding.message}`} className="bw-matrix__radio-finding" data-testid={`radio-finding-${radio.radioId}`}>
          <Tag minimal intent={finding.severity === 'info' ? Intent.NONE : Intent.WARNING}>
            {finding.title}
          </Tag>{' '}
          {finding.message}
        </p>
      ))}
      {radio.columns.length === 0 ? (
        <p className="bw-muted">
          {chosenOnly ? 'No part chosen for this radio.' : 'No part chosen or shortlisted for this radio yet: find candidates to add one.'}
        </p>
      ) : (
        <HTMLTable compact bordered className="bw-matrix__grid">
          <thead>
            <tr>
              <th scope="col">Band</th>
              {radio.columns.map(({ column }) => {
                const state = column.assignments.find((a) => a.radioId === radio.radioId)?.state;
                return (
                  <th key={column.partId} scope="col" title={`${column.manufacturer} ${column.title}`}>
                    <b>{column.mpn}</b>
                    <div className="bw-muted bw-matrix__part-sub">
                      {column.manufacturer}
                      {state === 'chosen' ? ' · chosen' : state === 'shortlisted' ? ' · shortlisted' : ''}
                    </div>
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {radio.rows.map(({ index: r, row }) => (
              <tr key={row.bandId}>
                <th scope="row">
                  {row.designation}
                  {row.findings.map((finding) => (
                    <div key={finding.code} className="bw-muted bw-matrix__part-sub" title={finding.message} data-testid={`row-finding-${row.bandId}`}>
                      {finding.title}: {finding.message}
                    </div>
                  ))}
                </th>
                {radio.columns.map(({ index: c, column }) => {
                  const cell = radio.cellAt(r, c);
                  if (!cell) return <td key={column.partId} className="bw-muted" />;
                  const look = STATUS_LOOK[cell.status];
                  const finding = decidingFinding(cell);
                  const chosen = column.assignments.some((a) => a.radioId === radio.radioId && a.state === 'chosen');
                  return (
                    <td key={column.partId} className={`bw-matrix__td bw-matrix__td--${cell.status}`}>
                      <button
                        type="button"
                        className={`bw-matrix__cell${chosen ? ' bw-matrix__cell--assigned' : ''}`}
                        data-testid={`cell-${radio.radioId}-${row.bandId}-${column.partId}`}
                        data-status={cell.status}
                        onClick={() => onSelect(cell)}
                        title={finding?.message ?? look.label}
                      >
                        <Tag intent={look.intent} icon={look.icon} minimal={cell.status === 'no-data'}>
                          {look.label}
                        </Tag>
                        {finding && <span className="bw-matrix__reason">{finding.title}</span>}
                        {chosen && <Icon icon="star" size={10} title="chosen for this radio" />}
                      </button>
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
    </div>
  );
}

interface MatrixPrintoutProps {
  matrix: Matrix;
}

/** The matrix as the browser prints the page: every cell with its findings, under the full caution. */
function MatrixPrintout({ matrix }: MatrixPrintoutProps) {
  return (
    <div className="bw-print-only bw-matrix__report">
      <h2>Compatibility matrix: {matrix.productName}</h2>
      <ScreeningCaution />
      <HTMLTable compact bordered>
        <thead>
          <tr>
            <th>Radio band</th>
            <th>Part</th>
            <th>Verdict</th>
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
                      {f.title}: {f.message}
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
