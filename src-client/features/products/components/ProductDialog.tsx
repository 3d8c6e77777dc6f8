import { FormEvent, useState } from 'react';
import { Button, Callout, Checkbox, Dialog, DialogBody, DialogFooter, FormGroup, InputGroup, Intent, TextArea } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { useCreateProduct } from '../api/create-product';
import { useUpdateProduct } from '../api/update-product';
import { type ProductDetail, type ProductSummary, type Region, REGIONS } from '../types';
import { numberOrNull, textOf } from './form-values';

export interface ProductDialogProps {
  /** The product to edit; a new product when null. */
  product: ProductSummary | null;
  onClose: () => void;
  onSaved?: (product: ProductDetail) => void;
}

/** Create or edit a product's name, code, owner, ground plane and markets. */
export function ProductDialog({ product, onClose, onSaved }: ProductDialogProps) {
  const create = useCreateProduct();
  const update = useUpdateProduct();
  const mutation = product ? update : create;
  const [name, setName] = useState(product?.name ?? '');
  const [code, setCode] = useState(product?.code ?? '');
  const [owner, setOwner] = useState(product?.owner ?? '');
  const [length, setLength] = useState(textOf(product?.groundPlaneLengthMm));
  const [width, setWidth] = useState(textOf(product?.groundPlaneWidthMm));
  const [regions, setRegions] = useState<Region[]>(product?.targetRegions ?? ['EU']);
  const [notes, setNotes] = useState(product?.notes ?? '');
  const error = mutation.error instanceof ApiError ? mutation.error : null;
  // A 409 on a unique field (PRODUCT_CODE_TAKEN) names its field too: show it inline like a 400.
  const fe: Record<string, string> = { ...(error?.fieldErrors ?? {}), ...(typeof error?.body.field === 'string' ? { [error.body.field]: error.message } : {}) };
  const conflict = error?.status === 409 && error.code.endsWith('VERSION_CONFLICT');

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const input = {
      name,
      code,
      owner,
      targetRegions: regions,
      notes: notes.trim() ? notes : null,
      groundPlaneLengthMm: numberOrNull(length),
      groundPlaneWidthMm: numberOrNull(width),
    };
    const done = {
      onSuccess: (saved: ProductDetail) => {
        onSaved?.(saved);
        onClose();
      },
    };
    if (product) update.mutate({ id: product.id, version: product.version, ...input }, done);
    else create.mutate(input, done);
  };
  const text = (id: string, label: string, value: string, onChange: (v: string) => void, key: string, rightText?: string) => (
    <FormGroup label={label} labelFor={id} intent={fe[key] ? Intent.DANGER : Intent.NONE} helperText={fe[key]}>
      <InputGroup
        id={id}
        value={value}
        onValueChange={onChange}
        intent={fe[key] ? Intent.DANGER : Intent.NONE}
        rightElement={rightText ? <span className="bw-unit">{rightText}</span> : undefined}
      />
    </FormGroup>
  );

  return (
    <Dialog isOpen onClose={onClose} title={product ? `Edit ${product.name}` : 'New product'} icon="box" style={{ width: 600 }}>
      <form onSubmit={submit}>
        <DialogBody>
          {conflict && (
            <Callout intent={Intent.WARNING} className="bw-gap" title="Changed by someone else">
              {error!.message}
            </Callout>
          )}
          {error && !conflict && !Object.keys(fe).length && (
            <Callout intent={Intent.DANGER} className="bw-gap">
              {error.message}
            </Callout>
          )}
          {text('product-name', 'Product name', name, setName, 'name')}
          <div className="bw-form-grid">
            {text('product-code', 'Code', code, setCode, 'code')}
            {text('product-owner', 'Owner', owner, setOwner, 'owner')}
            {text('product-length', 'Ground plane length', length, setLength, 'groundPlaneLengthMm', 'mm')}
            {text('product-width', 'Ground plane width', width, setWidth, 'groundPlaneWidthMm', 'mm')}
          </div>
          <FormGroup label="Target regions" intent={fe.targetRegions ? Intent.DANGER : Intent.NONE} helperText={fe.targetRegions}>
            {REGIONS.map((r) => (
              <Checkbox
                key={r}
                inline
                label={r}
                checked={regions.includes(r)}
                onChange={() => setRegions((cur) => (cur.includes(r) ? cur.filter((x) => x !== r) : [...cur, r]))}
              />
            ))}
          </FormGroup>
          <FormGroup label="Notes" labelFor="product-notes" intent={fe.notes ? Intent.DANGER : Intent.NONE} helperText={fe.notes}>
            <TextArea id="product-notes" value={notes} onChange={(e) => setNotes(e.currentTarget.value)} fill rows={3} />
          </FormGroup>
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button type="submit" intent={Intent.PRIMARY} loading={mutation.isPending} text={product ? 'Save product' : 'Create product'} />
            </>
          }
        />
      </form>
    </Dialog>
  );
}
