import {
  CHAR_0,
  CHAR_9,
  CHAR_BANG,
  CHAR_BRACKET,
  CHAR_CR,
  CHAR_DOT,
  CHAR_HASH,
  CHAR_LF,
  CHAR_MINUS,
  CHAR_PLUS,
  LineNumbers,
  isBlank,
  latin1,
  nextLineStart,
  scanNumbers,
} from './data-lines';
import { TouchstoneError } from './errors';
import { type KeywordReader, type ReaderState, initialReaderState, readKeyword, readReferenceValues, readVersionLine } from './keywords';
import { NetworkBuilder } from './network';
import { type OptionLine, parseOptionLine } from './option-line';
import {
  TOUCHSTONE_MAX_BYTES,
  TOUCHSTONE_MAX_LINE_BYTES,
  TOUCHSTONE_MAX_POINTS,
  TOUCHSTONE_MAX_PORTS,
  type TouchstoneNetwork,
  type TouchstoneReadOptions,
} from './types';

/**
 * Touchstone reader for versions 1.x and 2.x, any number of ports up to TOUCHSTONE_MAX_PORTS (IBIS Touchstone File Format Specification
 * Rev 1.1 (2002), Version 2.0 (2009), Version 2.1 (2024)). Data of any parameter (S, Y, Z, H, G) are
 * returned as S-parameters against the file's reference resistances; Z and Y files of more than 2 ports,
 * and mixed-mode data, are refused with TOUCHSTONE_UNSUPPORTED.
 */
export function readTouchstone(input: string | Uint8Array, options: TouchstoneReadOptions = {}): TouchstoneNetwork {
  const maxBytes = options.maxBytes ?? TOUCHSTONE_MAX_BYTES;
  const tooLarge = (size: number) =>
    new TouchstoneError('TOUCHSTONE_TOO_LARGE', null, `the file is ${size} bytes; the limit is ${maxBytes} bytes (${(maxBytes / 1048576).toFixed(0)} MiB)`);
  if (typeof input === 'string' && input.length > maxBytes) throw tooLarge(input.length);
  const bytes = typeof input === 'string' ? new TextEncoder().encode(input) : input;
  if (bytes.length > maxBytes) throw tooLarge(bytes.length);
  return new TouchstoneReader(bytes, options).read();
}

/** One pass over the lines: comments and blanks skipped, data lines scanned from bytes, the rest as text. */
class TouchstoneReader implements KeywordReader {
  readonly state: ReaderState = initialReaderState();
  private readonly maxPoints: number;
  private readonly maxLineBytes: number;
  private readonly numbers: LineNumbers;
  private network: NetworkBuilder | null = null;
  private sawContent = false;
  // A point may wrap over several lines (version 2, and version 1 above 2 ports); these hold the partial point.
  private pending = new Float64Array(0);
  private pendingCount = 0;
  private pendingLine = 0;

  constructor(
    private readonly bytes: Uint8Array,
    private readonly options: TouchstoneReadOptions,
  ) {
    this.maxPoints = options.maxPoints ?? TOUCHSTONE_MAX_POINTS;
    this.maxLineBytes = options.maxLineBytes ?? TOUCHSTONE_MAX_LINE_BYTES;
    // A number takes at least two bytes with its separator, so a line never holds more than this.
    this.numbers = new LineNumbers(Math.ceil(this.maxLineBytes / 2) + 1);
  }

  get pointCount(): number {
    return this.network?.pointCount ?? 0;
  }

  read(): TouchstoneNetwork {
    const { bytes, state } = this;
    const length = bytes.length;
    let lineNumber = 0;
    let position = 0;
    while (position < length && state.section !== 'ended') {
      lineNumber++;
      const lineStart = position;
      let first = position;
      while (first < length && isBlank(bytes[first])) first++;
      const lead = first < length ? bytes[first] : CHAR_LF;
      if (lead === CHAR_LF || lead === CHAR_CR || lead === CHAR_BANG) {
        position = nextLineStart(bytes, first);
        this.checkLineLength(lineStart, position, lineNumber);
        continue;
      }
      // Data lines, the bulk of a file, are scanned once: numbers straight from the bytes.
      const isNumberStart = (lead >= CHAR_0 && lead <= CHAR_9) || lead === CHAR_MINUS || lead === CHAR_PLUS || lead === CHAR_DOT;
      if (isNumberStart && state.section !== 'information' && state.referencePending === 0) {
        this.sawContent = true;
        position = nextLineStart(bytes, scanNumbers(bytes, first, this.numbers, lineNumber));
        this.checkLineLength(lineStart, position, lineNumber);
        this.readDataLine(lineNumber);
        continue;
      }
      let contentEnd = first;
      while (contentEnd < length) {
        const c = bytes[contentEnd];
        if (c === CHAR_LF || c === CHAR_CR || c === CHAR_BANG) break;
        contentEnd++;
      }
      position = nextLineStart(bytes, contentEnd);
      this.checkLineLength(lineStart, position, lineNumber);
      this.readTextLine(lead, latin1(bytes, first, contentEnd), first, lineNumber);
    }
    return this.finish(lineNumber);
  }

  /** Every line is measured after one linear pass and before any string is made of it. */
  private checkLineLength(lineStart: number, lineEnd: number, lineNumber: number): void {
    if (lineEnd - lineStart > this.maxLineBytes) {
      throw new TouchstoneError('TOUCHSTONE_LINE_TOO_LONG', lineNumber, `the line is ${lineEnd - lineStart} bytes long; the limit is ${this.maxLineBytes}`);
    }
  }

  /** A line that does not start like a number: [Version], the option line, a keyword, [Reference] values, or bad data. */
  private readTextLine(lead: number, text: string, first: number, lineNumber: number): void {
    const state = this.state;
    if (state.section === 'information') {
      if (lead === CHAR_BRACKET) readKeyword(this, text.trim(), lineNumber);
      return;
    }
    if (!this.sawContent) {
      this.sawContent = true;
      if (lead === CHAR_BRACKET) {
        readVersionLine(state, text.trim(), lineNumber);
        return;
      }
    }
    if (lead === CHAR_HASH) {
      // Only the first option line counts (Touchstone 1.1 and 2.0, Option Line).
      if (!state.option) {
        if (state.isVersion2 && state.section !== 'header') {
          throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', lineNumber, `the option line must come before [Network Data]`);
        }
        state.option = parseOptionLine(text, lineNumber);
      }
      return;
    }
    if (lead === CHAR_BRACKET) {
      readKeyword(this, text.trim(), lineNumber);
      return;
    }
    if (state.referencePending > 0) {
      readReferenceValues(state, text, lineNumber);
      return;
    }
    // Anything else is a data line that does not start like a number.
    scanNumbers(this.bytes, first, this.numbers, lineNumber);
    this.readDataLine(lineNumber);
  }

  private readDataLine(lineNumber: number): void {
    if (this.state.isVersion2) this.readVersion2Data(lineNumber);
    else this.readVersion1Data(lineNumber);
  }

  startNetworkData(lineNumber: number, ports: number): void {
    const state = this.state;
    const option = state.option;
    if (!option)
      throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', lineNumber, `data before the option line (# <unit> <parameter> <format> R <ohms>)`);
    if ((option.parameter === 'H' || option.parameter === 'G') && ports !== 2) {
      throw new TouchstoneError(
        'TOUCHSTONE_BAD_OPTION_LINE',
        option.lineNumber,
        `${option.parameter} parameters describe 2-port networks; this file has ${ports} port`,
      );
    }
    if ((option.parameter === 'Z' || option.parameter === 'Y') && ports > 2) {
      throw new TouchstoneError(
        'TOUCHSTONE_UNSUPPORTED',
        option.lineNumber,
        `${option.parameter} parameters are read for 1- and 2-port files only; export the ${ports}-port data as S-parameters`,
      );
    }
    const references = state.referenceOhms ?? option.referenceOhms;
    if (references.length !== 1 && references.length !== ports) {
      throw new TouchstoneError(
        'TOUCHSTONE_BAD_OPTION_LINE',
        state.referenceOhms ? state.referenceLine : option.lineNumber,
        `${references.length} reference resistances for a ${ports}-port file`,
      );
    }
    state.referenceOhms = references.length === ports ? [...references] : new Array<number>(ports).fill(references[0]);
    if (!state.isVersion2 && option.referenceOhms.length > 1) state.version = '1.1';
    state.ports = ports;
    this.network = new NetworkBuilder(
      {
        ports,
        parameter: option.parameter,
        format: option.format,
        frequencyUnit: option.frequencyUnit,
        referenceOhms: state.referenceOhms,
        twoPortDataOrder: state.twoPortDataOrder ?? '21_12',
        matrixFormat: state.matrixFormat,
        version1: !state.isVersion2,
      },
      this.maxPoints,
      this.bytes.length,
    );
    this.pending = new Float64Array(this.network.valuesPerPoint);
  }

  checkPorts(ports: number, lineNumber: number, how: string): void {
    const expected = this.options.expectedPorts;
    if (expected !== undefined && expected !== ports) {
      throw new TouchstoneError(
        'TOUCHSTONE_WRONG_PORT_COUNT',
        lineNumber,
        `the file name says ${expected} port${expected === 1 ? '' : 's'} but ${how} ${ports}`,
      );
    }
    if (ports > TOUCHSTONE_MAX_PORTS) {
      throw new TouchstoneError('TOUCHSTONE_WRONG_PORT_COUNT', lineNumber, `at most ${TOUCHSTONE_MAX_PORTS} ports are read, ${how} ${ports}`);
    }
  }

  private addNoisePoint(values: Float64Array, count: number, lineNumber: number): void {
    const state = this.state;
    if (count !== 5) throw new TouchstoneError('TOUCHSTONE_DATA_LINE_LENGTH', lineNumber, `a noise data line needs 5 numbers, found ${count}`);
    const frequencyHz = values[0] * this.network!.frequencyMultiplier;
    if (!(frequencyHz > state.lastNoiseFrequencyHz)) {
      throw new TouchstoneError('TOUCHSTONE_FREQUENCY_NOT_INCREASING', lineNumber, `noise frequency ${values[0]} does not increase`);
    }
    state.lastNoiseFrequencyHz = frequencyHz;
    state.noisePointCount++;
  }

  private readVersion1Data(lineNumber: number): void {
    const { state, numbers, options } = this;
    const count = numbers.count;
    if (state.ports === null) {
      if (!state.option)
        throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', lineNumber, `data before the option line (# <unit> <parameter> <format> R <ohms>)`);
      // Version 1 has no port keyword: the file name, or else the first data line, says how many.
      const root = Math.round(Math.sqrt((count - 1) / 2));
      const impliedPorts = root >= 1 && 1 + 2 * root * root === count ? root : undefined;
      // Above 2 ports a line holds one row (or 4 pairs of it), so only 1- and 2-port names can be contradicted here.
      const nameSaysFewPorts = options.expectedPorts !== undefined && options.expectedPorts <= 2;
      if (nameSaysFewPorts && impliedPorts !== undefined && impliedPorts !== options.expectedPorts) {
        this.checkPorts(impliedPorts, lineNumber, 'this line holds data for');
      }
      const ports = options.expectedPorts ?? impliedPorts;
      if (ports === undefined) {
        throw new TouchstoneError('TOUCHSTONE_DATA_LINE_LENGTH', lineNumber, `a data line needs 3 numbers (1-port) or 9 (2-port), found ${count}`);
      }
      this.checkPorts(ports, lineNumber, 'the data are for');
      this.startNetworkData(lineNumber, ports);
    }
    const ports = state.ports!;
    const network = this.network!;
    if (state.section === 'noise') {
      this.addNoisePoint(numbers.values, count, lineNumber);
      return;
    }
    // Above 2 ports each matrix row starts a new line and wraps after 4 pairs (Touchstone 1.1, Network Data).
    if (ports > 2) {
      this.accumulate(lineNumber);
      return;
    }
    if (count === network.valuesPerPoint) {
      network.addPoint(numbers.values, lineNumber);
      return;
    }
    // Version 1 2-port noise data start where the frequency stops increasing (Touchstone 1.1, Noise Parameter Data).
    if (ports === 2 && count === 5 && numbers.values[0] * network.frequencyMultiplier <= network.lastFrequencyHz) {
      state.section = 'noise';
      this.addNoisePoint(numbers.values, count, lineNumber);
      return;
    }
    throw new TouchstoneError(
      'TOUCHSTONE_DATA_LINE_LENGTH',
      lineNumber,
      `a ${ports}-port data line needs ${network.valuesPerPoint} numbers${ports === 2 ? ' (or 5 in a noise block)' : ''}, found ${count}`,
    );
  }

  flushPending(lineNumber: number): void {
    if (this.pendingCount > 0) {
      throw new TouchstoneError(
        'TOUCHSTONE_DATA_LINE_LENGTH',
        this.pendingLine,
        `a ${this.state.ports}-port data point needs ${this.network!.valuesPerPoint} numbers, found ${this.pendingCount} before line ${lineNumber}`,
      );
    }
  }

  private readVersion2Data(lineNumber: number): void {
    const state = this.state;
    if (state.section === 'noise') {
      this.addNoisePoint(this.numbers.values, this.numbers.count, lineNumber);
      return;
    }
    if (state.section !== 'network') {
      throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `data outside [Network Data] / [Noise Data]`);
    }
    this.accumulate(lineNumber);
  }

  /** Adds a line's numbers to the point being read; a point is complete at valuesPerPoint and never spills over. */
  private accumulate(lineNumber: number): void {
    const { state, numbers, pending } = this;
    const count = numbers.count;
    const network = this.network!;
    const valuesPerPoint = network.valuesPerPoint;
    if (this.pendingCount === 0 && count === valuesPerPoint) {
      network.addPoint(numbers.values, lineNumber);
      return;
    }
    if (this.pendingCount === 0) this.pendingLine = lineNumber;
    if (this.pendingCount + count > valuesPerPoint) {
      throw new TouchstoneError(
        'TOUCHSTONE_DATA_LINE_LENGTH',
        this.pendingLine,
        `a ${state.ports}-port data point needs ${valuesPerPoint} numbers, found ${this.pendingCount + count} (each frequency starts a new line)`,
      );
    }
    for (let k = 0; k < count; k++) pending[this.pendingCount + k] = numbers.values[k];
    this.pendingCount += count;
    if (this.pendingCount === valuesPerPoint) {
      network.addPoint(pending, this.pendingLine);
      this.pendingCount = 0;
    }
  }

  private finish(lastLine: number): TouchstoneNetwork {
    const state = this.state;
    if (!this.sawContent) throw new TouchstoneError('TOUCHSTONE_EMPTY', null, `the file is empty (no option line and no data)`);
    if (state.isVersion2 && state.section !== 'ended') {
      throw new TouchstoneError('TOUCHSTONE_MISSING_END', Math.max(lastLine, 1), `a version-2 file must end with [End]`);
    }
    if (!state.option)
      throw new TouchstoneError('TOUCHSTONE_MISSING_OPTION_LINE', null, `the file has no option line (# <unit> <parameter> <format> R <ohms>)`);
    if (!state.isVersion2) this.flushPending(Math.max(lastLine, 1));
    if (!this.network || this.network.pointCount === 0) throw new TouchstoneError('TOUCHSTONE_EMPTY', null, `the file holds no data points`);
    const option: OptionLine = state.option;
    return {
      version: state.version,
      ports: state.ports!,
      parameter: option.parameter,
      format: option.format,
      frequencyUnit: option.frequencyUnit,
      referenceOhms: state.referenceOhms!,
      twoPortDataOrder: state.ports === 2 ? (state.twoPortDataOrder ?? '21_12') : null,
      matrixFormat: state.matrixFormat,
      ...this.network.finish(),
      noisePointCount: state.noisePointCount,
    };
  }
}

/** Ports implied by a Touchstone file name: `.s2p` → 2; `.ts` (version 2) and others → undefined. */
export function portsFromFileName(fileName: string): number | undefined {
  const match = /\.s(\d+)p$/i.exec(fileName);
  return match ? Number(match[1]) : undefined;
}
