import { TouchstoneError } from './errors';
import type { OptionLine } from './option-line';
import type { MatrixFormat, TwoPortDataOrder } from './types';

/** Version-2 keywords (`[Number of Ports] 2`, Touchstone 2.0 and 2.1) and the header state they set. */

export interface ReaderState {
  version: string;
  isVersion2: boolean;
  option: OptionLine | null;
  ports: number | null;
  twoPortDataOrder: TwoPortDataOrder | null;
  matrixFormat: MatrixFormat;
  frequencyCount: number | null;
  frequencyCountLine: number;
  noiseFrequencyCount: number | null;
  referenceOhms: number[] | null;
  referencePending: number;
  referenceLine: number;
  section: 'header' | 'network' | 'noise' | 'information' | 'ended';
  noisePointCount: number;
  lastNoiseFrequencyHz: number;
}

export function initialReaderState(): ReaderState {
  return {
    version: '1.0',
    isVersion2: false,
    option: null,
    ports: null,
    twoPortDataOrder: null,
    matrixFormat: 'Full',
    frequencyCount: null,
    frequencyCountLine: 0,
    noiseFrequencyCount: null,
    referenceOhms: null,
    referencePending: 0,
    referenceLine: 0,
    section: 'header',
    noisePointCount: 0,
    lastNoiseFrequencyHz: -Infinity,
  };
}

/** What a keyword may ask of the reader beyond its state. */
export interface KeywordReader {
  readonly state: ReaderState;
  readonly pointCount: number;
  checkPorts(ports: number, lineNumber: number, how: string): void;
  startNetworkData(lineNumber: number, ports: number): void;
  /** Refuses a point left incomplete when a keyword ends the data. */
  flushPending(lineNumber: number): void;
}

/** Splits `[Keyword Name] rest` into a normalised lower-case name and the rest; null if unterminated. */
function splitKeyword(text: string): { name: string; argument: string } | null {
  const close = text.indexOf(']');
  if (close < 0) return null;
  return { name: text.slice(1, close).trim().toLowerCase().replace(/\s+/g, ' '), argument: text.slice(close + 1).trim() };
}

function positiveInteger(argument: string, keyword: string, lineNumber: number): number {
  const value = /^\d+$/.test(argument) ? Number(argument) : NaN;
  if (!(value >= 1)) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `${keyword} needs a positive whole number, found '${argument}'`);
  return value;
}

/** The first line of a version-2 file: `[Version] 2.0` or `[Version] 2.1`. */
export function readVersionLine(state: ReaderState, text: string, lineNumber: number): void {
  const keyword = splitKeyword(text);
  if (!keyword || keyword.name !== 'version') {
    throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `a version-2 file must start with [Version]`);
  }
  if (keyword.argument !== '2.0' && keyword.argument !== '2.1') {
    throw new TouchstoneError('TOUCHSTONE_UNSUPPORTED_VERSION', lineNumber, `[Version] ${keyword.argument} is not supported (expected 2.0 or 2.1)`);
  }
  state.isVersion2 = true;
  state.version = keyword.argument;
}

/** Resistances of [Reference], which may continue over the following lines. */
export function readReferenceValues(state: ReaderState, text: string, lineNumber: number): void {
  for (const token of text.split(/\s+/).filter((t) => t.length > 0)) {
    const ohms = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i.test(token) ? Number(token) : NaN;
    if (!(ohms > 0)) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Reference] needs positive resistances in ohms, found '${token}'`);
    if (state.referencePending === 0) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Reference] has more values than ports`);
    state.referenceOhms!.push(ohms);
    state.referencePending--;
  }
}

export function readKeyword(reader: KeywordReader, text: string, lineNumber: number): void {
  const state = reader.state;
  const keyword = splitKeyword(text);
  if (!keyword) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `a keyword needs a closing ']'`);
  if (!state.isVersion2) {
    throw new TouchstoneError('TOUCHSTONE_UNKNOWN_KEYWORD', lineNumber, `keyword [${keyword.name}] needs [Version] 2.0 on the first line`);
  }
  if (state.section === 'information') {
    if (keyword.name === 'end information') state.section = 'header';
    return;
  }
  if (state.referencePending > 0) {
    throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', state.referenceLine, `[Reference] needs ${state.ports} values`);
  }
  const inHeader = state.section === 'header';
  const headerOnly = () => {
    if (!inHeader) throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[${keyword.name}] must come before [Network Data]`);
  };
  switch (keyword.name) {
    case 'version':
      throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Version] must be the first keyword`);
    case 'number of ports': {
      headerOnly();
      const ports = positiveInteger(keyword.argument, '[Number of Ports]', lineNumber);
      reader.checkPorts(ports, lineNumber, '[Number of Ports] says');
      state.ports = ports;
      return;
    }
    case 'two-port data order': {
      headerOnly();
      const order = keyword.argument.toUpperCase();
      if (order !== '12_21' && order !== '21_12')
        throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Two-Port Data Order] must be 12_21 or 21_12, found '${keyword.argument}'`);
      state.twoPortDataOrder = order;
      return;
    }
    case 'number of frequencies':
      headerOnly();
      state.frequencyCount = positiveInteger(keyword.argument, '[Number of Frequencies]', lineNumber);
      state.frequencyCountLine = lineNumber;
      return;
    case 'number of noise frequencies':
      headerOnly();
      state.noiseFrequencyCount = positiveInteger(keyword.argument, '[Number of Noise Frequencies]', lineNumber);
      return;
    case 'reference':
      headerOnly();
      if (state.ports === null) throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Reference] needs [Number of Ports] first`);
      state.referenceOhms = [];
      state.referencePending = state.ports;
      state.referenceLine = lineNumber;
      readReferenceValues(state, keyword.argument, lineNumber);
      return;
    case 'matrix format': {
      headerOnly();
      const formatName = keyword.argument.toLowerCase();
      if (formatName !== 'full' && formatName !== 'lower' && formatName !== 'upper') {
        throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Matrix Format] must be Full, Lower or Upper, found '${keyword.argument}'`);
      }
      state.matrixFormat = formatName === 'full' ? 'Full' : formatName === 'lower' ? 'Lower' : 'Upper';
      return;
    }
    case 'begin information':
      headerOnly();
      state.section = 'information';
      return;
    case 'network data': {
      headerOnly();
      if (state.ports === null) throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Number of Ports] is required before [Network Data]`);
      if (state.ports === 2 && state.twoPortDataOrder === null) {
        throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Two-Port Data Order] is required for a 2-port file`);
      }
      if (state.frequencyCount === null)
        throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[Number of Frequencies] is required before [Network Data]`);
      reader.startNetworkData(lineNumber, state.ports);
      state.section = 'network';
      return;
    }
    case 'noise data':
      if (state.section !== 'network') throw new TouchstoneError('TOUCHSTONE_BAD_KEYWORD', lineNumber, `[Noise Data] must follow [Network Data]`);
      reader.flushPending(lineNumber);
      state.section = 'noise';
      return;
    case 'end':
      if (state.section === 'header') throw new TouchstoneError('TOUCHSTONE_MISSING_KEYWORD', lineNumber, `[End] before [Network Data]`);
      reader.flushPending(lineNumber);
      if (reader.pointCount !== state.frequencyCount) {
        throw new TouchstoneError(
          'TOUCHSTONE_FREQUENCY_COUNT_MISMATCH',
          lineNumber,
          `[Number of Frequencies] on line ${state.frequencyCountLine} says ${state.frequencyCount} but [Network Data] holds ${reader.pointCount}`,
        );
      }
      if (state.noiseFrequencyCount !== null && state.noisePointCount !== state.noiseFrequencyCount) {
        throw new TouchstoneError(
          'TOUCHSTONE_NOISE_COUNT_MISMATCH',
          lineNumber,
          `[Number of Noise Frequencies] says ${state.noiseFrequencyCount} but [Noise Data] holds ${state.noisePointCount}`,
        );
      }
      state.section = 'ended';
      return;
    case 'mixed-mode order':
      throw new TouchstoneError(
        'TOUCHSTONE_UNSUPPORTED',
        lineNumber,
        `[Mixed-Mode Order] (differential and common-mode data) is not supported; export single-ended S-parameters`,
      );
    default:
      throw new TouchstoneError('TOUCHSTONE_UNKNOWN_KEYWORD', lineNumber, `unknown or unsupported keyword [${keyword.name}]`);
  }
}
