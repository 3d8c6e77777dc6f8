import { Button, Callout, H5, HTMLTable, Intent, NonIdealState, Popover, Tag } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { useIsolation } from '../api/get-isolation';
import type { InProductMeasurement, IsolationAntenna, IsolationCell } from '../types';
import { antennaLabel, eccText, isolationText, roleAndPortText } from './in-product-words';
import { bandPairsWorstFirst, correlationGroups, isolationTables } from './isolation-layout';

export interface IsolationViewProps {
  productId: number;
  files: InProductMeasurement[];
}

/** The isolation between the mapped antennas of each file, and the envelope correlation between the antennas of one radio. */
export function IsolationView({ productId, files }: IsolationViewProps) {
  const isolation = useIsolation(productId);
  const data = isolation.data;
  return (
    <QueryState isPending={isolation.isPending} error={isolation.error}>
      {data &&
        (data.antennas.length < 2 ? (
          <NonIdealState
            icon="antenna"
            title="No isolation figures yet"
            description="Map at least two ports of a file to antennas of the product's radios to see the isolation between them."
          />
        ) : (
          <>
            <H5 className="bw-in-product__heading">Isolation between antennas</H5>
            <p className="bw-muted">
              Each cell is the least isolation (−20·log₁₀|S<sub>ij</sub>|, in dB) over every pair of bands the two antennas&apos; radios use; choose a cell to
              see its band pairs. More is better.
            </p>
            {isolationTables(data, files).map((table) => (
              <div key={table.measurementId} className="bw-in-product__matrix" data-testid={`isolation-matrix-${table.measurementId}`}>
                <HTMLTable compact bordered className="bw-isolation">
                  <caption className="bw-muted">{table.fileName}</caption>
                  <thead>
                    <tr>
                      <th />
                      {table.labels.map((label) => (
                        <th key={label} scope="col">
                          {label}
                        </th>
                      ))}
                    </tr>
                  </thead>
                  <tbody>
                    {table.grid.map((cells, i) => (
                      <tr key={table.labels[i]}>
                        <th scope="row">{table.labels[i]}</th>
                        {cells.map((cell, j) =>
                          i === j ? (
                            <td key={j} className="bw-isolation__self" aria-label="same antenna" />
                          ) : (
                            <td key={j}>{cell ? <IsolationFigure cell={cell} antennas={data.antennas} /> : '—'}</td>
                          ),
                        )}
                      </tr>
                    ))}
                  </tbody>
                </HTMLTable>
              </div>
            ))}
            <H5 className="bw-in-product__heading">Envelope correlation between antennas of one radio</H5>
            <div className="bw-in-product__correlation">
              {data.correlation.length === 0 ? (
                <p className="bw-muted" data-testid="correlation-none">
                  No radio has two antennas mapped in the same file, so there is no correlation to show.
                </p>
              ) : (
                <HTMLTable compact className="bw-correlation" data-testid="correlation">
                  <thead>
                    <tr>
                      <th>Band</th>
                      <th className="bw-num">Highest ECC in the band (0 to 1)</th>
                      <th className="bw-num">Limit</th>
                      <th />
                    </tr>
                  </thead>
                  {correlationGroups(data).map((group) => (
                    <tbody key={group.key} data-testid="correlation-group">
                      <tr className="bw-correlation__pair">
                        <th colSpan={4} scope="rowgroup">
                          {group.radioName} <span className="bw-muted">· {group.antennas}</span>
                        </th>
                      </tr>
                      {group.rows.map((row) => (
                        <tr key={row.bandId} data-testid="correlation-row" data-above={String(row.aboveThreshold)}>
                          <td>{row.band}</td>
                          <td className="bw-num" data-testid="ecc">
                            {eccText(row.worstEcc)}
                          </td>
                          <td className="bw-num">{row.threshold}</td>
                          <td>
                            {row.aboveThreshold === true ? (
                              <Tag intent={Intent.WARNING} icon="warning-sign">
                                Above the limit
                              </Tag>
                            ) : row.aboveThreshold === false ? (
                              <Tag intent={Intent.SUCCESS} minimal icon="tick">
                                Within
                              </Tag>
                            ) : null}
                          </td>
                        </tr>
                      ))}
                    </tbody>
                  ))}
                </HTMLTable>
              )}
              <Callout icon="info-sign" className="bw-in-product__assumption" data-testid="correlation-assumption">
                {data.correlationAssumption} The limit of {data.correlation[0]?.threshold ?? 0.5} is common practice for mobile MIMO and diversity.
              </Callout>
            </div>
          </>
        ))}
    </QueryState>
  );
}

/** The worst isolation of a pair, opening the list of its band pairs, least isolation first. */
function IsolationFigure({ cell, antennas }: { cell: IsolationCell; antennas: readonly IsolationAntenna[] }) {
  // Each band pair's bandA is a band of antenna a's radio, bandB of antenna b's.
  const a = antennas[cell.a];
  const b = antennas[cell.b];
  const between = `${antennaLabel(a)} and ${antennaLabel(b)}`;
  const pairs = bandPairsWorstFirst(cell);
  return (
    <Popover
      placement="bottom"
      content={
        <div className="bw-isolation__pairs" data-testid="isolation-band-pairs">
          <H5>Isolation by band pair</H5>
          <p className="bw-muted">{between}</p>
          <HTMLTable compact striped>
            <thead>
              <tr>
                <th>Band of {roleAndPortText(a)}</th>
                <th>Band of {roleAndPortText(b)}</th>
                <th className="bw-num">Least isolation</th>
              </tr>
            </thead>
            <tbody>
              {pairs.map((p) => (
                <tr key={`${p.bandA}|${p.bandB}`}>
                  <td>{p.bandA}</td>
                  <td>{p.bandB}</td>
                  <td className="bw-num">{isolationText(p.isolationDb)}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      }
    >
      <Button
        variant="minimal"
        size="small"
        className="bw-isolation__figure"
        data-testid="isolation-figure"
        aria-label={`Isolation between ${between}: ${isolationText(cell.worstIsolationDb)}; show the band pairs`}
        text={isolationText(cell.worstIsolationDb)}
        endIcon="caret-down"
      />
    </Popover>
  );
}
