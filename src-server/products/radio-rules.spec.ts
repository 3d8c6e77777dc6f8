import { type KnownBand, channelEdges, radioProblems, storedChannels } from './radio-rules';

const library = new Map<number, KnownBand>([
  // 3GPP TS 36.101 Table 5.5-1: B3 UL 1710–1785, DL 1805–1880 MHz.
  [
    103,
    {
      id: 103,
      technology: 'lte',
      designation: 'B3',
      ranges: [
        { role: 'uplink', fromMhz: 1710, toMhz: 1785 },
        { role: 'downlink', fromMhz: 1805, toMhz: 1880 },
      ],
    },
  ],
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

  describe('channels and GNSS bandwidth (issue 12)', () => {
    const lte = (channels: object[]) =>
      radioProblems({ technology: 'lte', transmitPowerDbm: 23, bands: [{ bandId: 103, certifiedMaxGainDbi: 5, channels }] }, library);

    it('accepts channels inside the transmit ranges, as edges or as centre and bandwidth', () => {
      expect(
        lte([
          { fromMhz: 1710, toMhz: 1715 },
          { centreMhz: 1782.5, bandwidthMhz: 5 },
        ]),
      ).toEqual([]);
      expect(storedChannels([{ centreMhz: 1782.5, bandwidthMhz: 5 }])).toEqual([{ fromMhz: 1780, toMhz: 1785 }]);
      // 869.525 ± 0.125 MHz lands on the 869.4 / 869.65 MHz sub-band edges exactly (to 1 Hz).
      expect(channelEdges({ centreMhz: 869.525, bandwidthMhz: 0.25 })).toEqual({ fromMhz: 869.4, toMhz: 869.65 });
      expect(storedChannels([])).toBeNull();
    });

    it('names the channel that lies outside the transmit ranges or mixes its forms', () => {
      expect(
        lte([
          { fromMhz: 1710, toMhz: 1715 },
          { centreMhz: 1840, bandwidthMhz: 5 },
        ]).map((p) => p.field),
      ).toEqual(['bands.0.channels.1']);
      expect(lte([{ fromMhz: 1783, toMhz: 1788 }]).map((p) => p.field)).toEqual(['bands.0.channels.0']);
      expect(lte([{ fromMhz: 1710, centreMhz: 1712 }]).map((p) => p.field)).toEqual(['bands.0.channels.0']);
      expect(lte([{ toMhz: 1715 }]).map((p) => p.field)).toEqual(['bands.0.channels.0']);
      expect(lte([{}]).map((p) => p.field)).toEqual(['bands.0.channels.0']);
    });

    it('keeps channels off receive-only radios and the GNSS bandwidth off other radios', () => {
      const gnss = radioProblems({ technology: 'gnss', transmitPowerDbm: null, bands: [{ bandId: 501, channels: [{ fromMhz: 1575, toMhz: 1576 }] }] }, library);
      expect(gnss.map((p) => p.field)).toEqual(['bands.0.channels']);
      const wifi = radioProblems({ technology: 'wifi', transmitPowerDbm: 18, gnssBandwidth: 'main-lobe', bands: [{ bandId: 601 }] }, library);
      expect(wifi.map((p) => p.field)).toEqual(['gnssBandwidth']);
      expect(radioProblems({ technology: 'gnss', transmitPowerDbm: null, gnssBandwidth: 'full-band', bands: [{ bandId: 501 }] }, library)).toEqual([]);
    });
  });
});
