import { formatSpecBands, parsePartCsv, parseSpecBandsText } from './part-csv';

describe(parseSpecBandsText.name, () => {
  it('reads bands with their limits and round-trips through formatSpecBands', () => {
    const { bands, error } = parseSpecBandsText('791-862 vswr=2 eff=45 peak=1.5; 880-960 rl=10 avg=-2.5');
    expect(error).toBeNull();
    expect(bands).toEqual([
      { fromMhz: 791, toMhz: 862, maxVswr: 2, efficiencyPct: 45, peakGainDbi: 1.5 },
      { fromMhz: 880, toMhz: 960, minReturnLossDb: 10, averageGainDbi: -2.5 },
    ]);
    expect(parseSpecBandsText(formatSpecBands(bands)).bands).toEqual(bands);
  });

  it('reads and writes what the figures include, refusing a basis outside its list', () => {
    const text = '791-862 vswr=3 eff=40 peak=1 effbasis=radiation effstat=minimum gainbasis=realized';
    const { bands, error } = parseSpecBandsText(text);
    expect(error).toBeNull();
    expect(bands).toEqual([
      {
        fromMhz: 791,
        toMhz: 862,
        maxVswr: 3,
        efficiencyPct: 40,
        peakGainDbi: 1,
        efficiencyBasis: 'radiation',
        efficiencyStatistic: 'minimum',
        gainBasis: 'realized',
      },
    ]);
    expect(formatSpecBands(bands)).toBe(text);
    expect(parseSpecBandsText('791-862 eff=40 effbasis=peak').error).toMatch(/band 1: effbasis= must be one of radiation, total/);
  });

  it('names the band and the token that is wrong', () => {
    expect(parseSpecBandsText('791-862; 960-880').error).toMatch(/band 2/);
    expect(parseSpecBandsText('791-862 gain=3').error).toMatch(/band 1: "gain=3"/);
  });
});

describe(parsePartCsv.name, () => {
  it('reports unknown and missing columns on the header line before any row', () => {
    const { problems } = parsePartCsv(Buffer.from('manufacturer,mpn,colour\nA,B,red\n'));
    expect(problems.map((p) => `${p.line}:${p.field}`)).toEqual(['1:colour', '1:title', '1:formFactor', '1:connector', '1:polarization']);
  });
});
