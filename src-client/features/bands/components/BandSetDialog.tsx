import { FormEvent, useMemo, useState } from 'react';
import { Button, Callout, Checkbox, Dialog, DialogBody, DialogFooter, FormGroup, H6, InputGroup, Intent, TextArea } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { useBands } from '../api/get-bands';
import { useCreateBandSet } from '../api/create-band-set';
import { useUpdateBandSet } from '../api/update-band-set';
import { type BandSet, type Technology, TECHNOLOGY_LABELS } from '../types';

export interface BandSetDialogProps {
  /** The set to edit; a new set when null. */
  set: BandSet | null;
  isOpen: boolean;
  onClose: () => void;
}

/** Create or edit a band set: name, description and its bands picked from the library. */
export function BandSetDialog({ set, isOpen, onClose }: BandSetDialogProps) {
  const bands = useBands();
  const create = useCreateBandSet();
  const update = useUpdateBandSet();
  const mutation = set ? update : create;
  const [name, setName] = useState(set?.name ?? '');
  const [description, setDescription] = useState(set?.description ?? '');
  const [chosen, setChosen] = useState<number[]>(set?.bandIds ?? []);
  const [search, setSearch] = useState('');
  const error = mutation.error instanceof ApiError ? mutation.error : null;
  const fieldErrors = error?.fieldErrors ?? {};
  const bandError = Object.entries(fieldErrors).find(([field]) => field.startsWith('bandIds'))?.[1];
  const conflict = error?.status === 409 && error.code.endsWith('VERSION_CONFLICT');

  const groups = useMemo(() => {
    const needle = search.trim().toLowerCase();
    const all = (bands.data ?? []).filter((b) => !needle || b.designation.toLowerCase().includes(needle) || b.name.toLowerCase().includes(needle));
    return (Object.keys(TECHNOLOGY_LABELS) as Technology[]).map((t) => ({ t, bands: all.filter((b) => b.technology === t) })).filter((g) => g.bands.length);
  }, [bands.data, search]);

  const toggle = (id: number) => setChosen((c) => (c.includes(id) ? c.filter((x) => x !== id) : [...c, id]));
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const input = { name, description, bandIds: chosen };
    const done = {
      onSuccess: () => {
        mutation.reset();
        onClose();
      },
    };
    if (set) update.mutate({ id: set.id, version: set.version, ...input }, done);
    else create.mutate(input, done);
  };

  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={set ? `Edit band set ${set.name}` : 'New band set'} icon="layers" style={{ width: 640 }}>
      <form onSubmit={submit}>
        <DialogBody>
          {conflict && (
            <Callout intent={Intent.WARNING} className="bw-gap" title="Changed by someone else">
              {error!.message}
            </Callout>
          )}
          {error && !conflict && !Object.keys(fieldErrors).length && (
            <Callout intent={Intent.DANGER} className="bw-gap">
              {error.message}
            </Callout>
          )}
          <FormGroup label="Name" labelFor="set-name" intent={fieldErrors.name ? Intent.DANGER : Intent.NONE} helperText={fieldErrors.name}>
            <InputGroup id="set-name" value={name} onValueChange={setName} maxLength={120} />
          </FormGroup>
          <FormGroup
            label="Description"
            labelFor="set-description"
            intent={fieldErrors.description ? Intent.DANGER : Intent.NONE}
            helperText={fieldErrors.description ?? "Say where the list comes from, and that operators' band lists vary and must be checked."}
          >
            <TextArea id="set-description" value={description} onChange={(e) => setDescription(e.currentTarget.value)} fill rows={3} />
          </FormGroup>
          <FormGroup
            label={`Bands (${chosen.length} chosen)`}
            labelFor="set-band-search"
            intent={bandError ? Intent.DANGER : Intent.NONE}
            helperText={bandError}
          >
            <InputGroup id="set-band-search" leftIcon="search" placeholder="Filter bands" value={search} onValueChange={setSearch} className="bw-gap" />
            <div className="bw-checklist">
              {groups.map((g) => (
                <div key={g.t}>
                  <H6>{TECHNOLOGY_LABELS[g.t]}</H6>
                  <div className="bw-checklist__items">
                    {g.bands.map((b) => (
                      <Checkbox key={b.id} inline label={b.designation} checked={chosen.includes(b.id)} onChange={() => toggle(b.id)} />
                    ))}
                  </div>
                </div>
              ))}
            </div>
          </FormGroup>
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button type="submit" intent={Intent.PRIMARY} loading={mutation.isPending} text={set ? 'Save set' : 'Create set'} />
            </>
          }
        />
      </form>
    </Dialog>
  );
}
