import { describe, expect, it } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { mappingBody, mappingProblems, mappingRowsOf, refusalLines, roleChoices, withRadio, withRole } from './port-mapping';

const radios = [
  { id: 21, name: 'LTE', antennaRoles: ['main' as const, 'diversity' as const] },
  { id: 22, name: 'Wi-Fi', antennaRoles: ['main' as const] },
];

describe(mappingRowsOf.name, () => {
  it('gives one row per port of the file, the unmapped ones not used', () => {
    expect(mappingRowsOf({ ports: 3, portMapping: [{ port: 2, radioId: 22, role: 'main', radioName: 'Wi-Fi' }] })).toEqual([
      { port: 1, radioId: null, role: null },
      { port: 2, radioId: 22, role: 'main' },
      { port: 3, radioId: null, role: null },
    ]);
  });
});

describe(withRadio.name, () => {
  it("gives a port the radio's first antenna no other port has, and clears the role when not used", () => {
    let rows = mappingRowsOf({ ports: 3, portMapping: [] });
    rows = withRadio(rows, 1, 21, radios);
    rows = withRadio(rows, 2, 21, radios);
    expect(rows.map((r) => r.role)).toEqual(['main', 'diversity', null]);
    rows = withRadio(rows, 1, null, radios);
    expect(rows[0]).toEqual({ port: 1, radioId: null, role: null });
    expect(roleChoices(radios, 21)).toEqual(['main', 'diversity']);
    expect(roleChoices(radios, null)).toEqual([]);
  });
});

describe(mappingBody.name, () => {
  it('sends the mapped ports only', () => {
    const rows = withRadio(mappingRowsOf({ ports: 4, portMapping: [] }), 3, 22, radios);
    expect(mappingBody(rows)).toEqual([{ port: 3, radioId: 22, role: 'main' }]);
  });
});

describe(mappingProblems.name, () => {
  it('names the second port given an antenna already taken, and a role the radio does not have', () => {
    let rows = withRadio(withRadio(mappingRowsOf({ ports: 3, portMapping: [] }), 1, 21, radios), 2, 21, radios);
    rows = withRole(rows, 2, 'main');
    rows = withRole(withRadio(rows, 3, 22, radios), 3, 'diversity');
    const problems = mappingProblems(rows, radios);
    expect([...problems.keys()]).toEqual([2, 3]);
    expect(problems.get(2)).toContain('port 1');
  });
  it('finds nothing wrong in a mapping the server would take', () => {
    const rows = withRadio(withRadio(mappingRowsOf({ ports: 2, portMapping: [] }), 1, 21, radios), 2, 21, radios);
    expect(mappingProblems(rows, radios).size).toBe(0);
  });
});

describe(refusalLines.name, () => {
  it("turns the server's [i].field problems into the port they concern, in words", () => {
    const sent = [
      { port: 1, radioId: 21, role: 'main' as const },
      { port: 3, radioId: 21, role: 'main' as const },
    ];
    const error = new ApiError(400, 'VALIDATION_FAILED', 'x', { fields: [{ field: '[1].role', message: "this radio's main antenna is already port 1" }] });
    expect(refusalLines(error, sent)).toEqual(["Port 3, antenna: this radio's main antenna is already port 1"]);
  });
  it('gives the message of any other refusal', () => {
    expect(refusalLines(new ApiError(404, 'NOT_FOUND', 'in-product measurement 9 not found'), [])).toEqual(['in-product measurement 9 not found']);
  });
});
