import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import {
  Button,
  ControlGroup,
  Dialog,
  DialogBody,
  FormGroup,
  HTMLSelect,
  HTMLTable,
  InputGroup,
  Intent,
  OverlayToaster,
  Position,
  Tag,
} from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { ANTENNA_ROLE_LABELS, type AntennaRole } from '../../../lib/antenna-role-labels';
import { useHasRole } from '../../../lib/session';
import { useCandidates } from '../api/get-candidates';
import { useChoosePart } from '../api/choose-part';
import { useEvaluation } from '../api/get-evaluation';
import { useShortlistPart } from '../api/shortlist-part';
import type { CandidateFilters, Connector, FormFactor } from '../types';
import { chosenRoles, firstOpenRole } from './antenna-choice';
import { STATUS_LOOK } from './cell-status';
import {
  FEED_WORDS,
  FORM_FACTOR_WORDS,
  NO_FILTERS,
  POLARIZATION_FIT_WORDS,
  candidateQuery,
  feedFitText,
  filtersFromParams,
  leadTimeText,
  priceText,
  withFilterParams,
} from './candidate-words';

export interface CandidatesDialogProps {
  productId: number;
  /** The radio to find parts for; null keeps the dialog closed. */
  radioId: number | null;
  /** The radio's antennas; with more than one, the user picks which one a part is chosen for. @default main only */
  antennaRoles?: readonly AntennaRole[];
  onClose: () => void;
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** Approved parts for one radio, best first, with the figure that decides each one's place. */
export function CandidatesDialog({ productId, radioId, antennaRoles, onClose }: CandidatesDialogProps) {
  // The filters live in the page address, so a reload, Back or a shared link shows the same list.
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = filtersFromParams(searchParams);
  const setFilters = (next: CandidateFilters) => setSearchParams((current) => withFilterParams(current, next), { replace: true });
  const candidates = useCandidates(productId, radioId, candidateQuery(filters, 30));
  const canAssign = useHasRole('engineer', 'admin');
  const shortlist = useShortlistPart();
  const choose = useChoosePart();
  const failed = (error: Error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: error.message }));
  // Which antenna a chosen part is for comes from the product's evaluation (the page shows it already, so it is cached).
  const evaluation = useEvaluation(productId);
  const roles: readonly AntennaRole[] = antennaRoles?.length ? antennaRoles : ['main'];
  const several = roles.length > 1;
  const chosenFor = chosenRoles(evaluation.data, radioId ?? 0);
  // The antenna picked is the radio's own: opening another radio's candidates starts again from its first open antenna.
  const [picked, setPicked] = useState<{ radioId: number | null; role: AntennaRole } | null>(null);
  const pickedRole = picked?.radioId === radioId ? picked.role : null;
  const role = pickedRole !== null && roles.includes(pickedRole) ? pickedRole : firstOpenRole(roles, chosenFor);
  const chosenForRole = evaluation.data?.radios.find((r) => r.radioId === radioId)?.chosen.find((p) => p.role === role);
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
                {c.evaluated} approved parts checked against every band of the radio; the best {c.candidates.length} are listed, ranked by verdict, then by how
                they fit the radio&apos;s {FEED_WORDS[c.radioConnector]} feed and polarization, then by the margin to the nearest limit.
              </p>
              <CandidateFilterBar filters={filters} onChange={setFilters} />
              {several && canAssign && (
                <FormGroup
                  label="Choose parts for the antenna"
                  labelFor="candidate-antenna"
                  inline
                  helperText={`${c.radioName} needs ${roles.length} antennas: ${roles.map((r) => ANTENNA_ROLE_LABELS[r]).join(', ')}. ${
                    chosenForRole
                      ? `The ${ANTENNA_ROLE_LABELS[role]} antenna is now ${chosenForRole.mpn}; choosing another part replaces it.`
                      : `No part is chosen for the ${ANTENNA_ROLE_LABELS[role]} antenna yet.`
                  }`}
                >
                  <HTMLSelect
                    id="candidate-antenna"
                    value={role}
                    onChange={(e) => setPicked({ radioId, role: e.currentTarget.value as AntennaRole })}
                    options={roles.map((r) => ({ value: r, label: ANTENNA_ROLE_LABELS[r] }))}
                  />
                </FormGroup>
              )}
              <ScreeningCaution compact />
              <HTMLTable compact striped className="bw-candidates" data-testid="candidates">
                <thead>
                  <tr>
                    <th>Verdict</th>
                    <th>Part</th>
                    <th>Why here</th>
                    <th>Fit to the radio</th>
                    <th>Price and lead time</th>
                    <th>Bands</th>
                    {canAssign && <th />}
                  </tr>
                </thead>
                <tbody>
                  {c.candidates.map((candidate) => {
                    const look = STATUS_LOOK[candidate.status];
                    const target = { productId, radioId: c.radioId, partId: candidate.partId };
                    const chosenRole = candidate.assignment === 'chosen' ? (chosenFor.get(candidate.partId) ?? 'main') : null;
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
                            {candidate.manufacturer} · {candidate.title} · {FORM_FACTOR_WORDS[candidate.formFactor]}
                          </div>
                        </td>
                        <td data-testid="explanation">
                          <b>{candidate.explanation.title}</b>
                          <div>{candidate.explanation.text}</div>
                        </td>
                        <td>
                          <div>{feedFitText(candidate.fit.feed, c.radioConnector, candidate.connector)}</div>
                          <div className="bw-muted">{POLARIZATION_FIT_WORDS[candidate.fit.polarization]}</div>
                        </td>
                        <td>
                          <div>{priceText(candidate.price, c.quantity)}</div>
                          <div className="bw-muted">{leadTimeText(candidate.price)}</div>
                        </td>
                        <td>
                          {candidate.bands.map((b) => (
                            <Tag
                              key={b.bandId}
                              minimal
                              intent={STATUS_LOOK[b.status].intent}
                              title={b.decidingFinding ? `${b.decidingFinding.title}: ${b.decidingFinding.message}` : STATUS_LOOK[b.status].label}
                              style={{ marginRight: 2 }}
                            >
                              {b.designation}
                            </Tag>
                          ))}
                        </td>
                        {canAssign && (
                          <td style={{ whiteSpace: 'nowrap' }}>
                            {chosenRole === role ? (
                              <Tag intent={Intent.PRIMARY} icon="star" data-testid="chosen-tag">
                                {several ? `chosen: ${ANTENNA_ROLE_LABELS[chosenRole]}` : 'chosen'}
                              </Tag>
                            ) : (
                              <>
                                {chosenRole !== null && (
                                  <Tag intent={Intent.PRIMARY} minimal icon="star" data-testid="chosen-tag">
                                    chosen: {ANTENNA_ROLE_LABELS[chosenRole]}
                                  </Tag>
                                )}
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
                                  text={several ? `Choose as ${ANTENNA_ROLE_LABELS[role]}` : 'Choose'}
                                  loading={choose.isPending && choose.variables?.partId === candidate.partId}
                                  onClick={() => choose.mutate({ ...target, role }, { onSuccess: onClose, onError: failed })}
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

interface CandidateFilterBarProps {
  filters: CandidateFilters;
  onChange: (filters: CandidateFilters) => void;
}

const CURRENCIES = ['USD', 'EUR', 'GBP'];

/** Form factor, feed, highest unit price and longest lead time, at a build quantity. */
function CandidateFilterBar({ filters, onChange }: CandidateFilterBarProps) {
  const set = (patch: Partial<CandidateFilters>) => onChange({ ...filters, ...patch });
  return (
    <div className="bw-candidates__filters" data-testid="candidate-filters">
      <FormGroup label="Form factor" labelFor="candidate-form-factor">
        <HTMLSelect
          id="candidate-form-factor"
          value={filters.formFactor[0] ?? ''}
          onChange={(e) => set({ formFactor: e.currentTarget.value ? [e.currentTarget.value as FormFactor] : [] })}
          options={[{ value: '', label: 'Any' }, ...Object.entries(FORM_FACTOR_WORDS).map(([value, label]) => ({ value, label }))]}
        />
      </FormGroup>
      <FormGroup label="Feed" labelFor="candidate-feed">
        <HTMLSelect
          id="candidate-feed"
          value={filters.feed[0] ?? ''}
          onChange={(e) => set({ feed: e.currentTarget.value ? [e.currentTarget.value as Connector] : [] })}
          options={[{ value: '', label: 'Any' }, ...Object.entries(FEED_WORDS).map(([value, label]) => ({ value, label }))]}
        />
      </FormGroup>
      <FormGroup label="Highest unit price" labelFor="candidate-max-price">
        <ControlGroup>
          <InputGroup
            id="candidate-max-price"
            inputMode="decimal"
            placeholder="no limit"
            value={filters.maxPrice}
            onValueChange={(maxPrice) => set({ maxPrice })}
            style={{ width: '7rem' }}
          />
          <HTMLSelect aria-label="Currency" value={filters.currency} onChange={(e) => set({ currency: e.currentTarget.value })} options={CURRENCIES} />
        </ControlGroup>
      </FormGroup>
      <FormGroup label="Longest lead time" labelFor="candidate-max-lead">
        <InputGroup
          id="candidate-max-lead"
          inputMode="numeric"
          placeholder="no limit"
          value={filters.maxLeadTimeDays}
          onValueChange={(maxLeadTimeDays) => set({ maxLeadTimeDays })}
          rightElement={<span className="bw-input-unit">days</span>}
          style={{ width: '8rem' }}
        />
      </FormGroup>
      <FormGroup label="Build quantity" labelFor="candidate-quantity">
        <InputGroup
          id="candidate-quantity"
          inputMode="numeric"
          value={String(filters.quantity)}
          onValueChange={(v) => set({ quantity: Math.max(1, Math.min(100_000_000, Math.trunc(Number(v)) || 1)) })}
          rightElement={<span className="bw-input-unit">pcs</span>}
          style={{ width: '8rem' }}
        />
      </FormGroup>
      <Button minimal text="Clear filters" onClick={() => onChange(NO_FILTERS)} />
    </div>
  );
}
