import { Button, Dialog, DialogBody, HTMLTable, Intent, OverlayToaster, Position, Tag } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { useHasRole } from '../../../lib/session';
import { useCandidates } from '../api/get-candidates';
import { useChoosePart } from '../api/choose-part';
import { useShortlistPart } from '../api/shortlist-part';
import { STATUS_LOOK } from './cell-status';

export interface CandidatesDialogProps {
  productId: number;
  /** The radio to find parts for; null keeps the dialog closed. */
  radioId: number | null;
  onClose: () => void;
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** Approved parts for one radio, best first, with the figure that decides each one's place. */
export function CandidatesDialog({ productId, radioId, onClose }: CandidatesDialogProps) {
  const candidates = useCandidates(productId, radioId);
  const canAssign = useHasRole('engineer', 'admin');
  const shortlist = useShortlistPart();
  const choose = useChoosePart();
  const failed = (error: Error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: error.message }));
  const c = candidates.data;
  return (
    <Dialog
      isOpen={radioId !== null}
      onClose={onClose}
      title={c ? `Candidates for ${c.radioName}` : 'Candidates'}
      icon="search"
      style={{ width: 'min(1100px, 96vw)' }}
    >
      <DialogBody>
        <QueryState isPending={candidates.isPending} error={candidates.error}>
          {c && (
            <>
              <p className="bw-muted">
                {c.evaluated} approved parts checked against every band of the radio; the best {c.candidates.length} are listed, ranked by state and then by the
                margin to the nearest limit.
              </p>
              <ScreeningCaution compact />
              <HTMLTable compact striped className="bw-candidates" data-testid="candidates">
                <thead>
                  <tr>
                    <th>State</th>
                    <th>Part</th>
                    <th>Deciding figure</th>
                    <th>Bands</th>
                    {canAssign && <th />}
                  </tr>
                </thead>
                <tbody>
                  {c.candidates.map((candidate) => {
                    const look = STATUS_LOOK[candidate.status];
                    const target = { productId, radioId: c.radioId, partId: candidate.partId };
                    return (
                      <tr key={candidate.partId} data-testid={`candidate-${candidate.partId}`} data-status={candidate.status}>
                        <td>
                          <Tag intent={look.intent} icon={look.icon} minimal={candidate.status === 'no-data'}>
                            {look.label}
                          </Tag>
                        </td>
                        <td>
                          <b>{candidate.mpn}</b>
                          <div className="bw-muted">
                            {candidate.manufacturer} · {candidate.title}
                          </div>
                        </td>
                        <td>{candidate.deciding?.text ?? 'no numeric limit applies'}</td>
                        <td>
                          {candidate.bands.map((b) => (
                            <Tag
                              key={b.bandId}
                              minimal
                              intent={STATUS_LOOK[b.status].intent}
                              title={b.findings.map((f) => f.message).join('; ')}
                              style={{ marginRight: 2 }}
                            >
                              {b.designation}
                            </Tag>
                          ))}
                        </td>
                        {canAssign && (
                          <td style={{ whiteSpace: 'nowrap' }}>
                            {candidate.assignment === 'chosen' ? (
                              <Tag intent={Intent.PRIMARY} icon="star">
                                chosen
                              </Tag>
                            ) : (
                              <>
                                {!candidate.assignment && (
                                  <Button
                                    small
                                    text="Shortlist"
                                    loading={shortlist.isPending && shortlist.variables?.partId === candidate.partId}
                                    onClick={() => shortlist.mutate(target, { onError: failed })}
                                  />
                                )}{' '}
                                <Button
                                  small
                                  intent={Intent.PRIMARY}
                                  text="Choose"
                                  loading={choose.isPending && choose.variables?.partId === candidate.partId}
                                  onClick={() => choose.mutate(target, { onSuccess: onClose, onError: failed })}
                                />
                              </>
                            )}
                          </td>
                        )}
                      </tr>
                    );
                  })}
                </tbody>
              </HTMLTable>
            </>
          )}
        </QueryState>
      </DialogBody>
    </Dialog>
  );
}
