import { DomainError } from '../../common/domain-error';
import { withTouchstoneStatus } from '../../common/touchstone-http-error';
import { CurveFileError, MEASUREMENT_MAX_POINTS, PASSIVE_REFLECTION_LIMIT } from '../../parts/measurements/measurement-parsers';
import { MEASUREMENT_MAX_BYTES } from '../../parts/measurements/measurements.service';
import { looksBinary } from '../../storage/limited-file-upload';
import type { UploadedFile } from '../../storage/uploaded-file';
import { type TouchstoneNetwork, portsFromFileName, readTouchstone } from '../../rf/touchstone';

/** Same caps as a part's measurement: 16 MiB and 100,000 points. */
export const IN_PRODUCT_MAX_BYTES = MEASUREMENT_MAX_BYTES;
/**
 * Most complex values (points × ports²) stored: 8 MB as doubles, inside a database's default 16 MiB packet.
 * Short numbers let a file under the byte cap hold far more (16 MiB of "0 0" pairs is about 64 MB as doubles).
 */
export const IN_PRODUCT_MAX_VALUES = 500_000;

export interface ParsedInProductFile {
  readonly network: TouchstoneNetwork;
  readonly sourceFormat: string;
}

/**
 * Reads an uploaded .sNp / .ts file of the whole assembly and checks what a store needs: at least two
 * points, finite values, and reflections a passive antenna can have. Every refusal names its file line.
 */
export function parseInProductFile(file: UploadedFile): ParsedInProductFile {
  if (file.size > IN_PRODUCT_MAX_BYTES) {
    throw new DomainError(
      'IN_PRODUCT_FILE_TOO_LARGE',
      `file: an in-product measurement may be at most ${IN_PRODUCT_MAX_BYTES / 1048576} MiB; nothing was stored`,
      413,
      {
        field: 'file',
        limitBytes: IN_PRODUCT_MAX_BYTES,
      },
    );
  }
  if (looksBinary(file.buffer)) {
    throw new DomainError(
      'IN_PRODUCT_FILE_TYPE_NOT_ALLOWED',
      `file: ${file.originalname} is not a text file; in-product measurements are Touchstone text`,
      415,
      {
        field: 'file',
      },
    );
  }
  const network = withTouchstoneStatus(() =>
    readTouchstone(file.buffer, { expectedPorts: portsFromFileName(file.originalname), maxPoints: MEASUREMENT_MAX_POINTS, maxBytes: IN_PRODUCT_MAX_BYTES }),
  );
  const n = network.frequenciesHz.length;
  const values = n * network.ports * network.ports;
  if (values > IN_PRODUCT_MAX_VALUES) {
    throw new DomainError(
      'IN_PRODUCT_TOO_MANY_VALUES',
      `file: ${network.ports} ports × ${n} points are ${values} complex values; at most ${IN_PRODUCT_MAX_VALUES} are stored (fewer points or ports); nothing was stored`,
      413,
      { field: 'file', limitValues: IN_PRODUCT_MAX_VALUES },
    );
  }
  if (n < 2) throw new CurveFileError('MEASUREMENT_TOO_FEW_POINTS', `A measurement needs at least two points; the file has ${n}`, null);
  for (let i = 0; i < n; i++) {
    const line = network.pointLines[i];
    for (let e = 0; e < network.s.length; e++) {
      const re = network.s[e].re[i];
      const im = network.s[e].im[i];
      if (!Number.isFinite(re) || !Number.isFinite(im))
        throw new CurveFileError('MEASUREMENT_VALUE_NOT_FINITE', `line ${line}: a value is not a finite number`, line);
    }
    for (let port = 1; port <= network.ports; port++) {
      const series = network.s[(port - 1) * network.ports + (port - 1)];
      const magnitude = Math.hypot(series.re[i], series.im[i]);
      if (!(magnitude <= PASSIVE_REFLECTION_LIMIT)) {
        throw new CurveFileError(
          'MEASUREMENT_REFLECTION_ABOVE_ONE',
          `line ${line}: |S${port}${port}| is ${magnitude.toPrecision(4)} at ${network.frequenciesHz[i] / 1e6} MHz; a passive antenna reflects at most what it receives, so this points to a calibration error`,
          line,
        );
      }
    }
  }
  return { network, sourceFormat: `Touchstone ${network.version}, ${network.ports}-port, ${network.parameter} ${network.format}` };
}
