import { type KnownBand, radioProblems } from './radio-rules';

const library = new Map<number, KnownBand>([
  [103, { id: 103, technology: 'lte', designation: 'B3' }],
  [501, { id: 501, technology: 'gnss', designation: 'GPS L1' }],
  [601, { id: 601, technology: 'wifi', designation: 'Wi-Fi 2.4 GHz' }],
]);

describe(radioProblems.name, () => {
  it('accepts a transmitting radio with power and bands of its own technology', () => {
    expect(radioProblems({ technology: 'lte', transmitPowerDbm: 23, bands: [{ bandId: 103, certifiedMaxGainDbi: 5 }] }, library)).toEqual([]);
  });

  it('accepts a GNSS radio without power or gains', () => {
    expect(radioProblems({ technology: 'gnss', transmitPowerDbm: null, bands: [{ bandId: 501 }] }, library)).toEqual([]);
  });

  it('names every problem by its field path, in order', () => {
    const problems = radioProblems(
      {
        technology: 'gnss',
        transmitPowerDbm: 10,
        bands: [{ bandId: 501, certifiedMaxGainDbi: 2 }, { bandId: 601 }, { bandId: 999 }, { bandId: 501 }],
      },
      library,
    );
    expect(problems.map((p) => p.field)).toEqual(['transmitPowerDbm', 'bands.0.certifiedMaxGainDbi', 'bands.1.bandId', 'bands.2.bandId', 'bands.3.bandId']);
    expect(problems[2].message).toMatch(/wifi band; a gnss radio takes only gnss bands/);
    expect(problems[3].message).toMatch(/999/);
    expect(problems[4].message).toMatch(/twice/);
  });

  it('requires transmit power for a transmitter', () => {
    expect(radioProblems({ technology: 'wifi', transmitPowerDbm: null, bands: [{ bandId: 601 }] }, library)).toEqual([
      { field: 'transmitPowerDbm', message: expect.stringContaining('required') },
    ]);
  });
});
