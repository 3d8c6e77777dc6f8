import { useState } from 'react';
import { Alert, Button, HTMLTable, Intent, NonIdealState, OverlayToaster, Position, Section, SectionCard, Tag } from '@blueprintjs/core';
import { useDeleteRadio } from '../api/delete-radio';
import { CONNECTOR_LABELS, type ProductDetail, type Radio, TECHNOLOGY_LABELS } from '../types';
import { RadioEditorDialog } from './RadioEditorDialog';

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

export interface RadiosSectionProps {
  product: ProductDetail;
  canEdit: boolean;
}

const bandText = (b: Radio['bands'][number]) =>
  typeof b.certifiedMaxGainDbi !== 'number' ? b.band.designation : `${b.band.designation} · ${b.certifiedMaxGainDbi} dBi`;

/** The radios of a product with their bands; engineers add, edit and remove them here. */
export function RadiosSection({ product, canEdit }: RadiosSectionProps) {
  const remove = useDeleteRadio();
  const [editing, setEditing] = useState<Radio | null | undefined>(undefined);
  const [deleting, setDeleting] = useState<Radio | null>(null);

  return (
    <Section
      title="Radios"
      subtitle="Each radio with the bands its antenna must cover and the module's certified maximum antenna gain per band"
      icon="satellite"
      rightElement={canEdit ? <Button icon="add" intent={Intent.PRIMARY} text="Add radio" onClick={() => setEditing(null)} /> : undefined}
      className="bw-gap"
    >
      <SectionCard padded={product.radios.length === 0}>
        {product.radios.length === 0 ? (
          <NonIdealState icon="satellite" title="No radios yet" description="Add the product's cellular modem, GNSS receiver, Wi-Fi, BLE or LoRa radios." />
        ) : (
          <HTMLTable compact striped className="bw-radios-table" data-testid="radios-table">
            <thead>
              <tr>
                <th>Radio</th>
                <th>Technology</th>
                <th>Module</th>
                <th>Tx power</th>
                <th>Polarization</th>
                <th>Feed</th>
                <th>Bands (certified max gain)</th>
                {canEdit && <th />}
              </tr>
            </thead>
            <tbody>
              {product.radios.map((radio) => (
                <tr key={radio.id} data-testid="radio-row">
                  <td>
                    <b>{radio.name}</b>
                  </td>
                  <td>{TECHNOLOGY_LABELS[radio.technology]}</td>
                  <td>{radio.module}</td>
                  <td>{radio.receiveOnly ? <Tag minimal>receive only</Tag> : `${radio.transmitPowerDbm ?? '—'} dBm`}</td>
                  <td>{radio.polarization}</td>
                  <td>
                    {CONNECTOR_LABELS[radio.connector]}, {radio.feedLossDb} dB
                  </td>
                  <td>
                    <div className="bw-tags">
                      {radio.bands.map((b) => (
                        <Tag key={b.band.id} minimal title={b.band.name}>
                          {bandText(b)}
                        </Tag>
                      ))}
                    </div>
                  </td>
                  {canEdit && (
                    <td className="bw-nowrap">
                      <Button size="small" variant="minimal" icon="edit" aria-label={`Edit ${radio.name}`} onClick={() => setEditing(radio)} />
                      <Button
                        size="small"
                        variant="minimal"
                        icon="trash"
                        intent={Intent.DANGER}
                        aria-label={`Delete ${radio.name}`}
                        onClick={() => setDeleting(radio)}
                      />
                    </td>
                  )}
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        )}
      </SectionCard>
      {editing !== undefined && <RadioEditorDialog key={editing?.id ?? 'new'} productId={product.id} radio={editing} onClose={() => setEditing(undefined)} />}
      <Alert
        isOpen={deleting !== null}
        intent={Intent.DANGER}
        icon="trash"
        confirmButtonText="Remove radio"
        cancelButtonText="Keep it"
        loading={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() =>
          deleting &&
          remove.mutate(
            { productId: product.id, radioId: deleting.id, version: deleting.version },
            {
              onSuccess: () => setDeleting(null),
              onError: (e) => {
                setDeleting(null);
                toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message }));
              },
            },
          )
        }
      >
        Remove the radio <b>{deleting?.name}</b> from {product.name}?
      </Alert>
    </Section>
  );
}
