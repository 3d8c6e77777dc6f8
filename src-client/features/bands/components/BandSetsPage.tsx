import { useState } from 'react';
import { Alert, Button, Card, H4, Intent, OverlayToaster, Position, Tag } from '@blueprintjs/core';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { useHasRole } from '../../../lib/session';
import { useBandSets } from '../api/get-band-sets';
import { useDeleteBandSet } from '../api/delete-band-set';
import type { BandSet } from '../types';
import { BandsNav } from '../../../components/BandsNav';
import { BandSetDialog } from './BandSetDialog';

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** Named band selections engineers pick from; admins maintain them. */
export function BandSetsPage() {
  const isAdmin = useHasRole('admin');
  const sets = useBandSets();
  const remove = useDeleteBandSet();
  const [editing, setEditing] = useState<BandSet | null | undefined>(undefined);
  const [deleting, setDeleting] = useState<BandSet | null>(null);

  return (
    <>
      <PageHeader
        title="Band sets"
        subtitle="Pick a market instead of single bands. Example sets only: operators' band lists vary and must be checked."
        actions={isAdmin && <Button icon="add" intent={Intent.PRIMARY} text="New band set" onClick={() => setEditing(null)} />}
      />
      <BandsNav />
      <QueryState isPending={sets.isPending} error={sets.error}>
        <div className="bw-grid-2">
          {(sets.data ?? []).map((set) => (
            <Card key={set.id} data-testid="band-set-card">
              <div className="bw-card-head">
                <H4>{set.name}</H4>
                {isAdmin && (
                  <div>
                    <Button variant="minimal" icon="edit" aria-label={`Edit ${set.name}`} onClick={() => setEditing(set)} />
                    <Button variant="minimal" icon="trash" intent={Intent.DANGER} aria-label={`Delete ${set.name}`} onClick={() => setDeleting(set)} />
                  </div>
                )}
              </div>
              <p className="bw-muted">{set.description}</p>
              <div className="bw-tags">
                {set.bands.map((b) => (
                  <Tag key={b.id} minimal title={b.name}>
                    {b.designation}
                  </Tag>
                ))}
              </div>
            </Card>
          ))}
        </div>
      </QueryState>
      {editing !== undefined && <BandSetDialog key={editing?.id ?? 'new'} set={editing} isOpen onClose={() => setEditing(undefined)} />}
      <Alert
        isOpen={deleting !== null}
        intent={Intent.DANGER}
        icon="trash"
        confirmButtonText="Delete set"
        cancelButtonText="Keep it"
        loading={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() =>
          deleting &&
          remove.mutate(
            { id: deleting.id, version: deleting.version },
            {
              onSuccess: () => setDeleting(null),
              onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })),
            },
          )
        }
      >
        Delete the band set <b>{deleting?.name}</b>? Radios that took bands from it keep their bands.
      </Alert>
    </>
  );
}
