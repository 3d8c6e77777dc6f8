import { useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, FileInput, FormGroup, InputGroup, Intent, ProgressBar } from '@blueprintjs/core';
import type { ApiError } from '../../../lib/api-client';
import { useUploadInProductMeasurement } from '../api/upload-in-product-measurement';
import type { InProductMeasurement } from '../types';
import { uploadRefusalText } from './in-product-words';

export interface InProductUploadDialogProps {
  productId: number;
  onClose: () => void;
  /** Called with the stored file, so the page can open its port mapping next. */
  onUploaded: (measurement: InProductMeasurement) => void;
}

/** Upload an N-port Touchstone file of the assembly; a refused file is explained with its line, and nothing is stored. */
export function InProductUploadDialog({ productId, onClose, onUploaded }: InProductUploadDialogProps) {
  const upload = useUploadInProductMeasurement();
  const [file, setFile] = useState<File | null>(null);
  const [note, setNote] = useState('');
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const line = typeof error?.body.line === 'number' ? error.body.line : null;

  const send = () => {
    if (!file) return;
    setError(null);
    setProgress(0);
    upload.mutate(
      { productId, file, note, onProgress: setProgress },
      {
        onSuccess: (measurement) => {
          setProgress(null);
          onUploaded(measurement);
        },
        onError: (e) => {
          setProgress(null);
          setError(e as ApiError);
        },
      },
    );
  };

  return (
    <Dialog isOpen onClose={onClose} title="Upload a measurement of the product" icon="upload" style={{ width: 620 }}>
      <DialogBody>
        <p className="bw-muted">
          A Touchstone file (.s2p, .s3p, .s4p … or version 2 .ts) measured or simulated with the antennas in this product&apos;s own enclosure and ground plane,
          one port per antenna. At most 16 MiB.
        </p>
        <FormGroup label="File" labelFor="in-product-file">
          <FileInput
            fill
            inputProps={{ id: 'in-product-file', 'aria-label': 'Touchstone file' }}
            text={file?.name ?? 'Choose file…'}
            hasSelection={!!file}
            onInputChange={(e) => {
              setFile((e.target as HTMLInputElement).files?.[0] ?? null);
              setError(null);
            }}
          />
        </FormGroup>
        <FormGroup label="Note" labelFor="in-product-note" labelInfo="(optional)">
          <InputGroup
            id="in-product-note"
            maxLength={500}
            placeholder="Enclosure, fixture, simulation or chamber the file comes from"
            value={note}
            onValueChange={setNote}
          />
        </FormGroup>
        {progress !== null && <ProgressBar value={progress} intent={Intent.PRIMARY} className="bw-gap" />}
        {error && (
          <Callout
            intent={Intent.DANGER}
            title={line !== null ? `The file was refused at line ${line}` : 'The file was refused'}
            data-testid="in-product-upload-error"
            data-line={line ?? undefined}
          >
            {uploadRefusalText(error.message)}
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onClose} />
            <Button intent={Intent.PRIMARY} icon="upload" text="Upload" disabled={!file} loading={upload.isPending} onClick={send} />
          </>
        }
      />
    </Dialog>
  );
}
