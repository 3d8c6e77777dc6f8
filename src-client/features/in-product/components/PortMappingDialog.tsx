import { useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, HTMLSelect, HTMLTable, Intent } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { ANTENNA_ROLE_LABELS } from '../../../lib/antenna-role-labels';
import { useMapInProductPorts } from '../api/map-in-product-ports';
import type { AntennaRole, InProductMeasurement, PortAssignment, RadioChoice } from '../types';
import { type MappingRow, mappingBody, mappingProblems, mappingRowsOf, refusalLines, roleChoices, withRadio, withRole } from './port-mapping';

export interface PortMappingDialogProps {
  measurement: InProductMeasurement;
  radios: readonly RadioChoice[];
  onClose: () => void;
}

const NOT_USED = '';

/** One row per port of the file: which radio's antenna it is, in which role, or not used; saved as a whole. */
export function PortMappingDialog({ measurement, radios, onClose }: PortMappingDialogProps) {
  const save = useMapInProductPorts();
  const [rows, setRows] = useState<MappingRow[]>(() => mappingRowsOf(measurement));
  const [refusal, setRefusal] = useState<string[]>([]);
  const problems = mappingProblems(rows, radios);
  const edit = (next: MappingRow[]) => {
    setRows(next);
    setRefusal([]);
  };

  const submit = () => {
    const body: PortAssignment[] = mappingBody(rows);
    save.mutate(
      { productId: measurement.productId, measurementId: measurement.id, ports: body },
      {
        onSuccess: onClose,
        onError: (e) => setRefusal(e instanceof ApiError ? refusalLines(e, body) : [e.message]),
      },
    );
  };

  return (
    <Dialog isOpen onClose={onClose} title={`Port mapping: ${measurement.fileName}`} icon="flow-linear" style={{ width: 680 }}>
      <DialogBody>
        <p className="bw-muted">
          Which antenna each port of the file is. A mapped port&apos;s S11 replaces the evaluation-board S11 of the part chosen for that antenna, and the ports
          mapped together give the isolation and envelope correlation below.
        </p>
        {radios.length === 0 && (
          <Callout intent={Intent.WARNING} className="bw-gap">
            The product has no radios yet; add them above, then map the ports.
          </Callout>
        )}
        <HTMLTable compact className="bw-port-mapping" data-testid="port-mapping">
          <thead>
            <tr>
              <th>Port</th>
              <th>Radio</th>
              <th>Antenna</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => {
              const problem = problems.get(row.port);
              const roles = roleChoices(radios, row.radioId);
              return (
                <tr key={row.port} data-testid={`port-row-${row.port}`}>
                  <th scope="row">Port {row.port}</th>
                  <td>
                    <HTMLSelect
                      aria-label={`Radio of port ${row.port}`}
                      value={row.radioId === null ? NOT_USED : String(row.radioId)}
                      onChange={(e) => edit(withRadio(rows, row.port, e.currentTarget.value === NOT_USED ? null : Number(e.currentTarget.value), radios))}
                      options={[{ value: NOT_USED, label: 'Not used' }, ...radios.map((r) => ({ value: String(r.id), label: r.name }))]}
                    />
                  </td>
                  <td>
                    <HTMLSelect
                      aria-label={`Antenna of port ${row.port}`}
                      disabled={row.radioId === null}
                      value={row.role ?? ''}
                      onChange={(e) => edit(withRole(rows, row.port, e.currentTarget.value as AntennaRole))}
                      options={row.radioId === null ? [{ value: '', label: '—' }] : roles.map((role) => ({ value: role, label: ANTENNA_ROLE_LABELS[role] }))}
                    />
                    {problem && (
                      <div className="bw-port-mapping__problem" data-testid={`port-problem-${row.port}`}>
                        {problem}
                      </div>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </HTMLTable>
        {refusal.length > 0 && (
          <Callout intent={Intent.DANGER} title="The mapping was not saved" className="bw-gap" data-testid="port-mapping-error">
            <ul className="bw-plain-list">
              {refusal.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onClose} />
            <Button intent={Intent.PRIMARY} text="Save mapping" disabled={problems.size > 0} loading={save.isPending} onClick={submit} />
          </>
        }
      />
    </Dialog>
  );
}
