import { readTouchstone } from '../../rf/touchstone';
import { type MappedAntenna, radioIsolationLookup } from './in-product-isolation';

// A 3-port file (Touchstone 1.1, MA, MHz), row-major per record; |S21| = 0.1 (20 dB), |S31| = 0.01 (40 dB), |S32| = 0.001 (60 dB) at 100 MHz.
const FILE = [
  '# MHz S MA R 50',
  '100 0.5 0 0.1 0 0.01 0',
  ' 0.1 0 0.5 0 0.001 0',
  ' 0.01 0 0.001 0 0.5 0',
  '200 0.5 0 0.01 0 0.1 0',
  ' 0.01 0 0.5 0 0.001 0',
  ' 0.1 0 0.001 0 0.5 0',
].join('\n');

const antenna = (port: number, radioId: number): MappedAntenna => ({ measurementId: 1, port, radioId, radioName: '', role: port === 2 ? 'diversity' : 'main' });

describe('measured isolation between two radios', () => {
  const network = readTouchstone(FILE, { expectedPorts: 3 });
  // Radio 10 has ports 1 and 2 (main, diversity); radio 20 has port 3.
  const lookup = radioIsolationLookup([{ measurementId: 1, network }], [antenna(1, 10), antenna(2, 10), antenna(3, 20)]);

  it('is the least isolation over every antenna pair of the two radios: −20·log10|Sij| (Pozar, Microwave Engineering §4.3)', () => {
    // At 100 MHz: port 3 → port 1 is 40 dB, port 3 → port 2 is 60 dB; the weaker path (40 dB) sets it.
    expect(lookup(20, 10, 100e6)).toBeCloseTo(40, 9);
    expect(lookup(10, 20, 100e6)).toBeCloseTo(40, 9);
    // At 200 MHz: |S31| = 0.1 (20 dB).
    expect(lookup(20, 10, 200e6)).toBeCloseTo(20, 9);
  });

  it('is linear in dB between sweep points', () => {
    expect(lookup(20, 10, 150e6)).toBeCloseTo(30, 9);
  });

  it('is unknown outside the sweep, between antennas of one radio, and for radios not in the file — never assumed', () => {
    expect(lookup(20, 10, 250e6)).toBeNull();
    expect(lookup(10, 10, 100e6)).toBeNull();
    expect(lookup(20, 30, 100e6)).toBeNull();
  });
});
