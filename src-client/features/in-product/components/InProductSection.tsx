import { useState } from 'react';
import { Alert, Button, HTMLTable, Intent, NonIdealState, OverlayToaster, Position, Section, SectionCard } from '@blueprintjs/core';
import { QueryState } from '../../../components/QueryState';
import { useHasRole } from '../../../lib/session';
import { useDeleteInProductMeasurement } from '../api/delete-in-product-measurement';
import { useDownloadInProductFile } from '../api/download-in-product-file';
import { useInProductMeasurements } from '../api/get-in-product-measurements';
import type { InProductMeasurement, RadioChoice } from '../types';
import { InProductUploadDialog } from './InProductUploadDialog';
import { IsolationView } from './IsolationView';
import { PortMappingDialog } from './PortMappingDialog';
import { countText, frequencySpanText, mappingLines } from './in-product-words';
import './in-product.css';

export interface InProductSectionProps {
  productId: number;
  /** The product's radios, whose antennas the ports are mapped to. */
  radios: readonly RadioChoice[];
}

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

/** "Measured in the product": the N-port files of the assembly, their port mapping, and the isolation and correlation they give. */
export function InProductSection({ productId, radios }: InProductSectionProps) {
  const files = useInProductMeasurements(productId);
  const canEdit = useHasRole('engineer', 'admin');
  const remove = useDeleteInProductMeasurement();
  const download = useDownloadInProductFile();
  const [uploading, setUploading] = useState(false);
  const [mapping, setMapping] = useState<InProductMeasurement | null>(null);
  const [deleting, setDeleting] = useState<InProductMeasurement | null>(null);
  const failed = (error: Error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: error.message }));
  const list = files.data ?? [];

  return (
    <Section
      title="Measured in the product"
      subtitle="Multi-port Touchstone files of the antennas in this product's enclosure"
      icon="antenna"
      rightElement={canEdit ? <Button icon="upload" intent={Intent.PRIMARY} text="Upload .sNp file" onClick={() => setUploading(true)} /> : undefined}
      className="bw-gap bw-in-product"
      data-testid="in-product"
    >
      <SectionCard padded={list.length === 0}>
        <QueryState isPending={files.isPending} error={files.error}>
          {list.length === 0 ? (
            <NonIdealState
              icon="antenna"
              title="No measurements in the product yet"
              description="Upload a multi-port file of the antennas in the enclosure; a mapped port's S11 then replaces the evaluation-board S11 in the verdict."
            />
          ) : (
            <HTMLTable compact striped className="bw-in-product__files" data-testid="in-product-files">
              <thead>
                <tr>
                  <th>File</th>
                  <th>Ports</th>
                  <th>Points</th>
                  <th>Frequency span</th>
                  <th>Mapped ports</th>
                  <th>Uploaded</th>
                  <th />
                </tr>
              </thead>
              <tbody>
                {list.map((m) => (
                  <tr key={m.id} data-testid={`in-product-file-${m.id}`}>
                    <td>
                      <b className="bw-in-product__name">{m.fileName}</b>
                      {m.note && <div className="bw-muted">{m.note}</div>}
                    </td>
                    <td className="bw-nowrap">{m.ports}</td>
                    <td className="bw-nowrap">{m.pointCount.toLocaleString('en')}</td>
                    <td className="bw-nowrap">{frequencySpanText(m)}</td>
                    <td className="bw-in-product__mapping">
                      {m.portMapping.length === 0 ? (
                        <span className="bw-muted">none yet</span>
                      ) : (
                        <ul className="bw-plain-list">
                          {mappingLines(m).map((line) => (
                            <li key={line}>{line}</li>
                          ))}
                        </ul>
                      )}
                      {m.portMapping.length > 0 && m.portMapping.length < m.ports && (
                        <div className="bw-muted">{countText(m.ports - m.portMapping.length, 'port', 'ports')} not used</div>
                      )}
                    </td>
                    <td>
                      <div className="bw-nowrap">{new Date(m.createdAt).toLocaleDateString(undefined, { dateStyle: 'medium' })}</div>
                      <div className="bw-muted">{m.uploadedBy?.name ?? 'demo data'}</div>
                    </td>
                    <td className="bw-nowrap bw-in-product__actions">
                      {canEdit && <Button size="small" icon="flow-linear" text="Map ports" onClick={() => setMapping(m)} />}
                      <Button
                        size="small"
                        variant="minimal"
                        icon="download"
                        aria-label={`Download ${m.fileName}`}
                        title="Download the original file"
                        loading={download.isPending && download.variables?.measurementId === m.id}
                        onClick={() => download.mutate({ productId, measurementId: m.id, fileName: m.fileName }, { onError: failed })}
                      />
                      {canEdit && (
                        <Button
                          size="small"
                          variant="minimal"
                          icon="trash"
                          intent={Intent.DANGER}
                          aria-label={`Delete ${m.fileName}`}
                          title="Delete the file and its port mapping"
                          onClick={() => setDeleting(m)}
                        />
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          )}
        </QueryState>
      </SectionCard>
      {list.some((m) => m.portMapping.length > 0) && (
        <SectionCard>
          <IsolationView productId={productId} files={list} />
        </SectionCard>
      )}
      {uploading && (
        <InProductUploadDialog
          productId={productId}
          onClose={() => setUploading(false)}
          onUploaded={(measurement) => {
            setUploading(false);
            // The next step is always the mapping: a file without it feeds nothing.
            setMapping(measurement);
          }}
        />
      )}
      {mapping && <PortMappingDialog key={mapping.id} measurement={mapping} radios={radios} onClose={() => setMapping(null)} />}
      <Alert
        isOpen={deleting !== null}
        intent={Intent.DANGER}
        icon="trash"
        confirmButtonText="Delete file"
        cancelButtonText="Keep it"
        loading={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() =>
          deleting &&
          remove.mutate(
            { productId, measurementId: deleting.id },
            {
              onSuccess: () => setDeleting(null),
              onError: (e) => {
                setDeleting(null);
                failed(e);
              },
            },
          )
        }
      >
        Delete <b>{deleting?.fileName}</b> and its port mapping? The verdict goes back to the evaluation-board S11 for the antennas it mapped, and its isolation
        figures leave the page. The deletion is kept in the product&apos;s history.
      </Alert>
    </Section>
  );
}
