import { TouchstoneError } from './errors';
import type { DataFormat, FrequencyUnit, NetworkParameter } from './types';

/** The option line `# <unit> <parameter> <format> R <ohms>` (Touchstone 1.1 and 2.0, Option Line). */

export interface OptionLine {
  readonly frequencyUnit: FrequencyUnit;
  readonly parameter: NetworkParameter;
  readonly format: DataFormat;
  readonly referenceOhms: readonly number[];
  readonly lineNumber: number;
}

const UNIT_BY_TOKEN: Readonly<Record<string, FrequencyUnit>> = { HZ: 'Hz', KHZ: 'kHz', MHZ: 'MHz', GHZ: 'GHz' };
const PARAMETERS: readonly NetworkParameter[] = ['S', 'Y', 'Z', 'H', 'G'];
const FORMATS: readonly DataFormat[] = ['DB', 'MA', 'RI'];

export function parseOptionLine(text: string, lineNumber: number): OptionLine {
  const tokens = text
    .slice(1)
    .trim()
    .split(/\s+/)
    .filter((t) => t.length > 0);
  let frequencyUnit: FrequencyUnit | undefined;
  let parameter: NetworkParameter | undefined;
  let format: DataFormat | undefined;
  let referenceOhms: number[] | undefined;
  const bad = (detail: string): never => {
    throw new TouchstoneError('TOUCHSTONE_BAD_OPTION_LINE', lineNumber, detail);
  };
  for (let k = 0; k < tokens.length; k++) {
    const token = tokens[k].toUpperCase();
    if (token in UNIT_BY_TOKEN) {
      if (frequencyUnit) bad(`the option line gives the frequency unit twice`);
      frequencyUnit = UNIT_BY_TOKEN[token];
    } else if ((PARAMETERS as readonly string[]).includes(token)) {
      if (parameter) bad(`the option line gives the parameter twice`);
      parameter = token as NetworkParameter;
    } else if ((FORMATS as readonly string[]).includes(token)) {
      if (format) bad(`the option line gives the format twice`);
      format = token as DataFormat;
    } else if (token === 'R') {
      if (referenceOhms) bad(`the option line gives R twice`);
      referenceOhms = [];
      while (k + 1 < tokens.length && /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i.test(tokens[k + 1])) {
        const ohms = Number(tokens[++k]);
        if (!(ohms > 0)) bad(`reference resistance ${tokens[k]} must be positive`);
        referenceOhms.push(ohms);
      }
      if (referenceOhms.length === 0) bad(`R must be followed by the reference resistance in ohms`);
    } else if (/^[A-Z]*HZ$/.test(token)) {
      throw new TouchstoneError('TOUCHSTONE_UNKNOWN_UNIT', lineNumber, `unknown frequency unit '${tokens[k]}' (expected Hz, kHz, MHz or GHz)`);
    } else {
      bad(`unexpected '${tokens[k]}' on the option line (expected a unit Hz/kHz/MHz/GHz, a parameter S/Y/Z/H/G, a format DB/MA/RI, or R <ohms>)`);
    }
  }
  // Defaults when omitted: # GHz S MA R 50 (Touchstone 1.1, Option Line).
  return {
    frequencyUnit: frequencyUnit ?? 'GHz',
    parameter: parameter ?? 'S',
    format: format ?? 'MA',
    referenceOhms: referenceOhms ?? [50],
    lineNumber,
  };
}
