import { Button, Callout, H3, HTMLTable, Intent, OverlayToaster, Position, Tag } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { VERDICT_LOOK } from '../../../components/verdict-look';
import { useDownloadReport } from '../api/download-report';
import { useEvaluation } from '../api/get-evaluation';
import { chosenPartLines, keepUnitsTogether, sentence, verdictCounts } from './verdict-summary';
import './compatibility.css';

export interface ProductVerdictProps {
  productId: number;
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** The product's one answer and each radio's, with the deciding reason in words and the chosen parts; the PDF report to sign. */
export function ProductVerdict({ productId }: ProductVerdictProps) {
  const evaluation = useEvaluation(productId);
  const report = useDownloadReport();
  const e = evaluation.data;
  return (
    <section className="bw-verdict" aria-labelledby="bw-verdict-title" data-testid="product-verdict">
      <div className="bw-verdict__head">
        <H3 id="bw-verdict-title">Verdict</H3>
        <Button
          className="bw-no-print"
          icon="document"
          text="Report (PDF)"
          disabled={!e}
          loading={report.isPending}
          onClick={() =>
            e &&
            report.mutate(
              { productId, productName: e.productName },
              { onError: (error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: error.message })) },
            )
          }
        />
      </div>
      <QueryState isPending={evaluation.isPending} error={evaluation.error}>
        {e && (
          <>
            <Callout
              intent={VERDICT_LOOK[e.verdict].intent}
              icon={VERDICT_LOOK[e.verdict].icon}
              title={`Product: ${VERDICT_LOOK[e.verdict].label}`}
              data-testid="product-verdict-summary"
              data-verdict={e.verdict}
            >
              <div>{keepUnitsTogether(sentence(e.reason))}.</div>
              <div className="bw-muted">
                {verdictCounts(e)}. A product takes its worst radio; a radio not checked cannot pass. Checked{' '}
                {new Date(e.evaluatedAt).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' })}.
              </div>
            </Callout>
            <HTMLTable compact className="bw-verdict__radios" data-testid="radio-verdicts">
              <thead>
                <tr>
                  <th>Radio</th>
                  <th>Verdict</th>
                  <th>Why</th>
                  <th>Chosen part</th>
                </tr>
              </thead>
              <tbody>
                {e.radios.map((radio) => {
                  const look = VERDICT_LOOK[radio.verdict];
                  const band = radio.bands.find((b) => b.bandId === radio.decidingBandId);
                  return (
                    <tr key={radio.radioId} data-testid={`radio-verdict-${radio.radioId}`} data-verdict={radio.verdict}>
                      <td>
                        <b>{radio.name}</b>
                      </td>
                      <td>
                        <Tag intent={look.intent} icon={look.icon} minimal={radio.verdict === 'no-data'}>
                          {look.label}
                        </Tag>
                      </td>
                      <td>
                        {radio.decidingFinding && (
                          <div>
                            <b>{radio.decidingFinding.title}</b>
                            {band && <span className="bw-muted"> · {band.designation}</span>}
                          </div>
                        )}
                        <div className={radio.decidingFinding ? 'bw-muted' : undefined}>
                          {keepUnitsTogether(sentence(radio.decidingFinding?.message ?? radio.reason))}
                        </div>
                      </td>
                      <td data-testid="chosen-parts">
                        {radio.chosen.length === 0 ? (
                          <span className="bw-muted">No part chosen for this radio</span>
                        ) : (
                          chosenPartLines(radio).map((line) => (
                            <div key={line.key} className="bw-verdict__part" data-testid="chosen-part">
                              <div>
                                {line.role && (
                                  <Tag minimal className="bw-verdict__role">
                                    {line.role}
                                  </Tag>
                                )}
                                {line.part}
                              </div>
                              <div className="bw-muted bw-small" data-testid="s11-source">
                                {line.s11}
                              </div>
                            </div>
                          ))
                        )}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </HTMLTable>
          </>
        )}
      </QueryState>
    </section>
  );
}
