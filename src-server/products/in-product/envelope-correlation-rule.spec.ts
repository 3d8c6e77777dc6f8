import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { envelopeCorrelationRuleProblems, loadEnvelopeCorrelationRule } from './envelope-correlation-rule';

describe('the envelope correlation rule file', () => {
  it('ships with the common-practice mobile MIMO limit of 0.5 as a parameter, marking the band marginal', () => {
    const rule = loadEnvelopeCorrelationRule();
    expect(rule.parameters.maxEnvelopeCorrelation).toBe(0.5);
    expect(rule.severity).toBe('marginal');
    expect(rule.source).toContain('Blanch');
  });

  it('names every bad place of a broken file', () => {
    expect(
      envelopeCorrelationRuleProblems({
        id: 'x',
        title: 't',
        description: 'd',
        source: 's',
        version: 1,
        parameters: { maxEnvelopeCorrelation: 1.5 },
        severity: 'bad',
      }).map((p) => p.path),
    ).toEqual(['parameters.maxEnvelopeCorrelation', 'severity']);
    expect(envelopeCorrelationRuleProblems([])).toEqual([{ path: '', message: 'must be an object' }]);
    const file = join(mkdtempSync(join(tmpdir(), 'ecc-rule-')), 'rule.json');
    writeFileSync(file, '{ not json');
    expect(() => loadEnvelopeCorrelationRule(file)).toThrow(/system\/envelope-correlation.json/);
  });
});
