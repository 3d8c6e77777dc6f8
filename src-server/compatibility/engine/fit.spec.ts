import { feedFit, fitRank, polarizationFit } from './fit';

describe(feedFit.name, () => {
  it('fits the same feed directly, two coaxial connectors through an adapter, and a solder pad against a connector only by changing the board', () => {
    expect(feedFit('solder-pad', 'solder-pad')).toBe('direct');
    expect(feedFit('SMA', 'SMA')).toBe('direct');
    expect(feedFit('SMA', 'RP-SMA')).toBe('adapter');
    expect(feedFit('micro-coax', 'MMCX')).toBe('adapter');
    expect(feedFit('solder-pad', 'N')).toBe('board-change');
    expect(feedFit('solder-pad', 'micro-coax')).toBe('board-change');
    expect(feedFit('SMA', 'solder-pad')).toBe('board-change');
  });
});

describe(polarizationFit.name, () => {
  // Balanis, Antenna Theory 4th ed. §2.12: linear against circular loses 3.01 dB; the opposite circular sense rejects.
  it('matches the same sense, loses about 3 dB linear against circular, and rejects the opposite sense', () => {
    expect(polarizationFit('RHCP', 'RHCP')).toBe('matched');
    expect(polarizationFit('RHCP', 'linear')).toBe('loss');
    expect(polarizationFit('linear', 'RHCP')).toBe('loss');
    expect(polarizationFit('RHCP', 'LHCP')).toBe('opposite');
    expect(polarizationFit(null, 'LHCP')).toBe('matched');
    expect(polarizationFit('RHCP', null)).toBe('unknown');
  });
});

describe(fitRank.name, () => {
  it('adds one per step away from the radio', () => {
    expect(fitRank('direct', 'matched')).toBe(0);
    expect(fitRank('adapter', 'matched')).toBe(1);
    expect(fitRank('direct', 'loss')).toBe(1);
    expect(fitRank('board-change', 'loss')).toBe(3);
    expect(fitRank('board-change', 'opposite')).toBe(4);
  });
});
