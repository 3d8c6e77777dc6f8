import { describe, expect, it } from 'vitest';
import type { EvaluationRadio } from '../types';
import { chosenPartLines, keepUnitsTogether, sentence, verdictCounts } from './verdict-summary';

const radio = (verdict: EvaluationRadio['verdict']) => ({ verdict }) as EvaluationRadio;

describe(chosenPartLines.name, () => {
  it('lists nothing when no part is chosen', () => {
    expect(chosenPartLines({ chosen: [] })).toEqual([]);
  });
  it('names a single chosen part with its maker and the evaluation-board S11, without an antenna', () => {
    expect(chosenPartLines({ chosen: [{ partId: 1, mpn: 'A-1', title: '', manufacturer: 'Maker', role: 'main', s11Source: 'evaluation board' }] })).toEqual([
      { key: '1-main', role: null, part: 'A-1 (Maker)', s11: 'S11 of the evaluation board' },
    ]);
  });
  it('names the antenna of each part when a radio has several, and where its S11 was measured', () => {
    const chosen = [
      { partId: 1, mpn: 'A-1', title: '', manufacturer: 'Maker', role: 'main' as const, s11Source: 'measured in product, file housing.s4p, port 1' },
      { partId: 2, mpn: 'B-2', title: '', manufacturer: 'Other', role: 'mimo-2' as const, s11Source: 'evaluation board' },
    ];
    expect(chosenPartLines({ chosen }).map((l) => [l.role, l.part, l.s11])).toEqual([
      ['main', 'A-1 (Maker)', 'S11 measured in product, file housing.s4p, port 1'],
      ['MIMO 2', 'B-2 (Other)', 'S11 of the evaluation board'],
    ]);
  });
  it('names the antenna of a lone part chosen for a diversity antenna', () => {
    const chosen = [{ partId: 2, mpn: 'B-2', title: '', manufacturer: 'Other', role: 'diversity' as const, s11Source: 'evaluation board' }];
    expect(chosenPartLines({ chosen })[0].role).toBe('diversity');
  });
});

describe(verdictCounts.name, () => {
  it('counts the radios per verdict, worst first', () => {
    expect(verdictCounts({ radios: [radio('pass'), radio('fail'), radio('pass'), radio('no-data')] })).toBe('1 radio fails, 1 not checked, 2 pass');
  });
});

describe(sentence.name, () => {
  it('raises the first letter only', () => {
    expect(sentence('bluetooth LE: efficiency')).toBe('Bluetooth LE: efficiency');
  });
});

describe(keepUnitsTogether.name, () => {
  it('joins a number and its unit with a no-break space', () => {
    expect(keepUnitsTogether('falls to 19.74 % at 2483.5 MHz')).toBe('falls to 19.74\u00a0% at 2483.5\u00a0MHz');
  });
});
