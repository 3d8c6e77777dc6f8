import { loadRuleFiles } from '../../compatibility/rule-files';
import { respellPolarizations } from './1765500000000-one-polarization-vocabulary';

type Json = Parameters<typeof respellPolarizations>[0];

const rule = (extra: Record<string, Json>): Json => ({
  id: 'admin-polarization',
  title: 'Polarization (admin)',
  severity: 'marginal',
  parameters: {},
  event: { type: 'finding', params: { code: 'ADMIN_POLARIZATION', message: 'a {partPolarization} part for a {requiredPolarization} radio' } },
  ...extra,
});

describe(respellPolarizations.name, () => {
  it('rewrites the literal polarizations of appliesWhen and of nested conditions, and leaves linear and other facts alone', () => {
    const stored = rule({
      appliesWhen: { all: [{ fact: 'requiredPolarization', operator: 'in', value: ['rhcp', 'lhcp', 'linear'] }] },
      conditions: {
        any: [
          { not: { fact: 'partPolarization', operator: 'equal', value: 'rhcp' } },
          { fact: 'designation', operator: 'equal', value: 'lhcp' },
          { fact: 'partPolarization', operator: 'equal', value: { fact: 'requiredPolarization' } },
        ],
      },
    });
    expect(respellPolarizations(stored, 'up')).toEqual(
      rule({
        appliesWhen: { all: [{ fact: 'requiredPolarization', operator: 'in', value: ['RHCP', 'LHCP', 'linear'] }] },
        conditions: {
          any: [
            { not: { fact: 'partPolarization', operator: 'equal', value: 'RHCP' } },
            { fact: 'designation', operator: 'equal', value: 'lhcp' },
            { fact: 'partPolarization', operator: 'equal', value: { fact: 'requiredPolarization' } },
          ],
        },
      }),
    );
  });

  it('rewrites the parameters a polarization condition names, and the keys of a table looked up by a polarization', () => {
    const stored = rule({
      parameters: { wanted: ['rhcp'], maxLossDb: { rhcp: 1, lhcp: 10, default: 3 }, other: 'rhcp' },
      conditions: {
        all: [
          { fact: 'partPolarization', operator: 'in', value: { param: 'wanted' } },
          { fact: 'polarizationLossDb', operator: 'greaterThan', value: { param: 'maxLossDb', key: 'requiredPolarization' } },
        ],
      },
    }) as { parameters: Json };
    expect((respellPolarizations(stored, 'up') as { parameters: Json }).parameters).toEqual({
      wanted: ['RHCP'],
      maxLossDb: { RHCP: 1, LHCP: 10, default: 3 },
      other: 'rhcp',
    });
  });

  it('leaves a rule in the API spelling, or without polarization, unchanged (so the migration may run over mixed data)', () => {
    expect(respellPolarizations(rule({ conditions: { all: [{ fact: 'requiredPolarization', operator: 'equal', value: 'RHCP' }] } }), 'up')).toBeNull();
    expect(respellPolarizations(rule({ conditions: { all: [{ fact: 'worstVswr', operator: 'greaterThan', value: 3 }] } }), 'up')).toBeNull();
  });

  it('spells the shipped rules as they are stored already, and down then up gives them back unchanged', () => {
    const shipped = loadRuleFiles().filter((r) => JSON.stringify(r).includes('Polarization"'));
    expect(shipped.map((r) => r.id)).toEqual(expect.arrayContaining(['gnss-polarization', 'polarization-opposite-sense']));
    for (const definition of shipped as unknown as Json[]) {
      expect(respellPolarizations(definition, 'up')).toBeNull();
      const old = respellPolarizations(definition, 'down');
      expect(JSON.stringify(old)).toContain('["rhcp","lhcp"]');
      expect(respellPolarizations(old, 'up')).toEqual(definition);
    }
  });
});
