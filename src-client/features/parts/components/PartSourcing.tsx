import { useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import {
  Alert,
  Button,
  Callout,
  Dialog,
  DialogBody,
  DialogFooter,
  FormGroup,
  HTMLTable,
  InputGroup,
  Intent,
  OverlayToaster,
  Position,
  Tag,
} from '@blueprintjs/core';
import { paths } from '../../../app/routes/paths';
import { ApiError } from '../../../lib/api-client';
import { useCreateOffer } from '../api/create-offer';
import { useDeleteOffer } from '../api/delete-offer';
import { useOfferRemovals } from '../api/get-offer-removals';
import { useRestoreOffer } from '../api/restore-offer';
import { useUpdateOffer } from '../api/update-offer';
import type { Offer, OfferFormInput, OfferRemoval, PartDetail } from '../types';
import { REVIEW_STATE_INTENT } from './part-labels';
import './review-offers.css';

const toaster = OverlayToaster.createAsync({ position: Position.TOP });
const fail = (e: Error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message }));

interface BreakDraft {
  key: number;
  quantity: string;
  unitPrice: string;
}

interface OfferDraft {
  supplier: string;
  sku: string;
  currency: string;
  moq: string;
  stock: string;
  leadTimeDays: string;
  lastCheckedOn: string;
  breaks: BreakDraft[];
}

let nextKey = 1;
const breakRow = (quantity = '', unitPrice = ''): BreakDraft => ({ key: nextKey++, quantity, unitPrice });
const text = (n: number | null) => (n === null ? '' : String(n));
const today = () => new Date().toISOString().slice(0, 10);

const draftOf = (o: Offer | null): OfferDraft =>
  o
    ? {
        supplier: o.supplier,
        sku: o.sku ?? '',
        currency: o.currency,
        moq: text(o.moq),
        stock: text(o.stock),
        leadTimeDays: text(o.leadTimeDays),
        lastCheckedOn: o.lastCheckedOn ?? today(),
        breaks: o.priceBreaks.map((b) => breakRow(String(b.quantity), b.unitPrice)),
      }
    : { supplier: '', sku: '', currency: 'USD', moq: '', stock: '', leadTimeDays: '', lastCheckedOn: today(), breaks: [breakRow('1')] };

/** A typed number, or null for an empty field; text that is not a number goes to the server as typed, which names the field. */
const numberOrNull = (value: string): number | string | null => (value.trim() === '' ? null : Number.isFinite(Number(value)) ? Number(value) : value);

const bodyOf = (d: OfferDraft): OfferFormInput => ({
  supplier: d.supplier.trim(),
  sku: d.sku.trim() || null,
  currency: d.currency.trim().toUpperCase(),
  moq: numberOrNull(d.moq),
  stock: numberOrNull(d.stock),
  leadTimeDays: numberOrNull(d.leadTimeDays),
  lastCheckedOn: d.lastCheckedOn || null,
  priceBreaks: d.breaks.map((b) => ({ quantity: numberOrNull(b.quantity), unitPrice: b.unitPrice.trim() })),
});

/** The server's field names in words, for messages it sends about a field not shown on its own. */
const FIELD_WORDS: Record<string, string> = { priceBreaks: 'Price breaks' };

/** Add or edit an offer: supplier, currency, any number of price breaks, MOQ, stock, lead time. */
function OfferDialog({ partId, offer, isOpen, onClose }: { partId: number; offer: Offer | null; isOpen: boolean; onClose: () => void }) {
  const create = useCreateOffer();
  const update = useUpdateOffer();
  const [draft, setDraft] = useState<OfferDraft>(() => draftOf(offer));
  const [errors, setErrors] = useState<Record<string, string>>({});
  useEffect(() => {
    if (isOpen) {
      setDraft(draftOf(offer));
      setErrors({});
    }
  }, [isOpen, offer]);
  const set = (field: keyof Omit<OfferDraft, 'breaks'>) => (e: React.ChangeEvent<HTMLInputElement>) => {
    const value = e.currentTarget.value;
    setDraft((d) => ({ ...d, [field]: value }));
    setErrors(({ [field]: _gone, ...rest }) => rest);
  };
  const setBreak = (key: number, field: 'quantity' | 'unitPrice', value: string) => {
    setDraft((d) => ({ ...d, breaks: d.breaks.map((b) => (b.key === key ? { ...b, [field]: value } : b)) }));
    const index = draft.breaks.findIndex((b) => b.key === key);
    setErrors(({ [`priceBreaks.${index}.${field}`]: _gone, priceBreaks: _all, ...rest }) => rest);
  };
  const onError = (e: Error) => {
    if (e instanceof ApiError && Object.keys(e.fieldErrors).length) setErrors(e.fieldErrors);
    else fail(e);
  };
  const save = () => {
    const body = bodyOf(draft);
    if (offer) update.mutate({ id: partId, offerId: offer.id, version: offer.version, ...body }, { onSuccess: onClose, onError });
    else create.mutate({ id: partId, ...body }, { onSuccess: onClose, onError });
  };
  const field = (key: keyof Omit<OfferDraft, 'breaks'>, label: string, props: { placeholder?: string; type?: string } = {}) => (
    <FormGroup label={label} labelFor={`offer-${key}`} intent={errors[key] ? Intent.DANGER : Intent.NONE} helperText={errors[key]}>
      <InputGroup id={`offer-${key}`} value={draft[key]} onChange={set(key)} intent={errors[key] ? Intent.DANGER : Intent.NONE} {...props} />
    </FormGroup>
  );
  const otherErrors = Object.entries(errors).filter(([k]) => !(k in draft) && !k.startsWith('priceBreaks.'));
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={offer ? `Edit offer from ${offer.supplier}` : 'Add supplier offer'} style={{ width: 560 }}>
      <DialogBody>
        <div className="bw-offer-fields">
          {field('supplier', 'Supplier')}
          {field('sku', 'Supplier part number (SKU)')}
          {field('currency', 'Currency', { placeholder: 'USD' })}
          {field('lastCheckedOn', 'Last checked', { type: 'date' })}
          {field('moq', 'Minimum order (pieces)')}
          {field('stock', 'Stock (pieces)')}
          {field('leadTimeDays', 'Lead time (days)')}
        </div>
        <fieldset className="bw-breaks" data-testid="price-breaks">
          <legend>Price breaks</legend>
          <div className="bw-break-row bw-break-row--head" aria-hidden="true">
            <span>From quantity (pieces)</span>
            <span>Unit price ({draft.currency || 'currency'})</span>
          </div>
          {draft.breaks.map((b, i) => {
            const qError = errors[`priceBreaks.${i}.quantity`];
            const pError = errors[`priceBreaks.${i}.unitPrice`];
            return (
              <div key={b.key}>
                <div className="bw-break-row">
                  <InputGroup
                    aria-label={`Break ${i + 1} quantity (pieces)`}
                    placeholder="from pieces"
                    value={b.quantity}
                    intent={qError ? Intent.DANGER : Intent.NONE}
                    onChange={(e) => setBreak(b.key, 'quantity', e.currentTarget.value)}
                  />
                  <InputGroup
                    aria-label={`Break ${i + 1} unit price (${draft.currency || 'currency'})`}
                    placeholder="unit price"
                    value={b.unitPrice}
                    rightElement={<span className="bw-unit">{draft.currency}</span>}
                    intent={pError ? Intent.DANGER : Intent.NONE}
                    onChange={(e) => setBreak(b.key, 'unitPrice', e.currentTarget.value)}
                  />
                  <Button
                    variant="minimal"
                    icon="cross"
                    aria-label={`Remove break ${i + 1}`}
                    disabled={draft.breaks.length === 1}
                    onClick={() => setDraft((d) => ({ ...d, breaks: d.breaks.filter((x) => x.key !== b.key) }))}
                  />
                </div>
                {(qError || pError) && (
                  <div className="bw-error-text">{[qError && `Quantity ${qError}`, pError && `Unit price ${pError}`].filter(Boolean).join('; ')}</div>
                )}
              </div>
            );
          })}
          {errors.priceBreaks && <div className="bw-error-text">{errors.priceBreaks}</div>}
          <Button
            icon="add"
            text="Add price break"
            variant="minimal"
            disabled={draft.breaks.length >= 20}
            onClick={() => setDraft((d) => ({ ...d, breaks: [...d.breaks, breakRow()] }))}
          />
        </fieldset>
        {otherErrors.length > 0 && (
          <Callout intent={Intent.DANGER} className="bw-gap">
            {otherErrors.map(([k, m]) => (
              <div key={k}>{`${FIELD_WORDS[k] ?? k}: ${m}`}</div>
            ))}
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onClose} />
            <Button intent={Intent.PRIMARY} text={offer ? 'Save offer' : 'Add offer'} loading={create.isPending || update.isPending} onClick={save} />
          </>
        }
      />
    </Dialog>
  );
}

/** Whole seconds left to undo, never more than the window (the clock ticks only while a removal is shown). */
const secondsLeft = (r: OfferRemoval, now: number) => {
  const window = Date.parse(r.undoUntil) - Date.parse(r.removedAt);
  return Math.max(0, Math.ceil(Math.min(window, Date.parse(r.undoUntil) - now) / 1000));
};

/** Removals that can still be undone, with the seconds left; the list comes from the server, so a reload keeps it. */
function Removals({ partId, enabled }: { partId: number; enabled: boolean }) {
  const removals = useOfferRemovals(partId, enabled);
  const restore = useRestoreOffer();
  const [now, setNow] = useState(() => Date.now());
  const open = (removals.data ?? []).filter((r) => Date.parse(r.undoUntil) > now);
  useEffect(() => {
    if (open.length === 0) return;
    const timer = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(timer);
  }, [open.length]);
  if (open.length === 0) return null;
  return (
    <>
      {open.map((r) => (
        <Callout key={r.offerId} intent={Intent.WARNING} icon="trash" className="bw-gap" data-testid="offer-removal">
          <div className="bw-row">
            <span>
              Offer from {r.supplier} removed. You can undo this for {secondsLeft(r, now)} s more.
            </span>
            <Button
              text="Undo"
              icon="undo"
              loading={restore.isPending && restore.variables?.offerId === r.offerId}
              onClick={() => restore.mutate({ id: partId, offerId: r.offerId }, { onError: fail })}
            />
          </div>
        </Callout>
      ))}
    </>
  );
}

/** Supplier offers (price breaks, MOQ, stock, lead time) and alternates; procurement and admins edit them. */
export function PartSourcing({ part }: { part: PartDetail }) {
  const remove = useDeleteOffer();
  const [editing, setEditing] = useState<Offer | 'new' | null>(null);
  const [removing, setRemoving] = useState<Offer | null>(null);
  const canEdit = part.permissions.editSourcing;
  return (
    <section className="bw-panel">
      <Removals partId={part.id} enabled={canEdit} />
      {part.offers.length === 0 ? (
        <p className="bw-muted">No offers yet.</p>
      ) : (
        <HTMLTable compact striped data-testid="offers">
          <thead>
            <tr>
              <th>Supplier</th>
              <th>SKU</th>
              <th>Price breaks</th>
              <th>MOQ</th>
              <th>Stock</th>
              <th>Lead time</th>
              <th>Checked</th>
              {canEdit && <th>Actions</th>}
            </tr>
          </thead>
          <tbody>
            {part.offers.map((o) => (
              <tr key={o.id} data-testid="offer-row">
                <td>{o.supplier}</td>
                <td>{o.sku ?? '—'}</td>
                <td data-testid="offer-breaks">
                  {o.priceBreaks.map((b) => (
                    <div key={b.quantity} className="bw-nowrap">
                      {b.quantity.toLocaleString()}+ pcs: {b.unitPrice} {o.currency}
                    </div>
                  ))}
                </td>
                <td>{o.moq === null ? '—' : `${o.moq.toLocaleString()} pcs`}</td>
                <td>{o.stock === null ? '—' : `${o.stock.toLocaleString()} pcs`}</td>
                <td>{o.leadTimeDays === null ? '—' : `${o.leadTimeDays} days`}</td>
                <td>{o.lastCheckedOn ? new Date(`${o.lastCheckedOn}T00:00:00`).toLocaleDateString() : '—'}</td>
                {canEdit && (
                  <td className="bw-nowrap">
                    <Button size="small" variant="minimal" icon="edit" aria-label={`Edit offer from ${o.supplier}`} onClick={() => setEditing(o)} />
                    <Button size="small" variant="minimal" icon="trash" aria-label={`Remove offer from ${o.supplier}`} onClick={() => setRemoving(o)} />
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
      {canEdit && <Button className="bw-gap" icon="add" text="Add offer" onClick={() => setEditing('new')} />}
      <h3>Alternates and second sources</h3>
      {part.alternates.length === 0 ? (
        <p className="bw-muted">None linked.</p>
      ) : (
        <ul>
          {part.alternates.map((a) => (
            <li key={a.partId}>
              <Link to={paths.part(a.partId)}>
                {a.manufacturer} {a.mpn}
              </Link>{' '}
              <Tag minimal>{a.kind}</Tag>{' '}
              <Tag minimal intent={REVIEW_STATE_INTENT[a.reviewState]}>
                {a.reviewState}
              </Tag>{' '}
              {a.note}
            </li>
          ))}
        </ul>
      )}
      <OfferDialog partId={part.id} offer={editing === 'new' ? null : editing} isOpen={editing !== null} onClose={() => setEditing(null)} />
      <Alert
        isOpen={removing !== null}
        intent={Intent.DANGER}
        icon="trash"
        confirmButtonText="Remove offer"
        cancelButtonText="Keep it"
        loading={remove.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() =>
          removing && remove.mutate({ id: part.id, offerId: removing.id }, { onSuccess: () => setRemoving(null), onError: (e) => (setRemoving(null), fail(e)) })
        }
      >
        <p>Remove the offer from {removing?.supplier}? You can undo this for 30 seconds.</p>
      </Alert>
    </section>
  );
}
