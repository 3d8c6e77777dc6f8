import { describe, expect, it } from 'vitest';
import { parseChannels } from './RadioEditorDialog';

describe(parseChannels.name, () => {
  // EU868 g3 sub-band 869.4–869.65 MHz (ERC/REC 70-03 Annex 1), written with an en dash or a hyphen.
  it('reads channels as from–to in MHz, separated by semicolons or commas', () => {
    expect(parseChannels('869.4–869.65; 868.0-868.6')).toEqual([
      { fromMhz: 869.4, toMhz: 869.65 },
      { fromMhz: 868, toMhz: 868.6 },
    ]);
    expect(parseChannels('')).toEqual([]);
  });
  it('refuses a piece that is not a range with its lower edge first', () => {
    expect(parseChannels('869.65–869.4')).toBeNull();
    expect(parseChannels('869.4')).toBeNull();
    expect(parseChannels('a–b')).toBeNull();
    expect(parseChannels('1–2–3')).toBeNull();
  });
});
