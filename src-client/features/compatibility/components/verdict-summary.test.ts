import { describe, expect, it } from 'vitest';
import type { EvaluationRadio } from '../types';
import { chosenPartsText, keepUnitsTogether, sentence, verdictCounts } from './verdict-summary';

const radio = (verdict: EvaluationRadio['verdict']) => ({ verdict }) as EvaluationRadio;

describe(chosenPartsText.name, () => {
  it('says so when no part is chosen', () => {
    expect(chosenPartsText({ chosen: [] })).toBe('No part chosen for this radio');
  });
  it('names each chosen part with its maker', () => {
    expect(chosenPartsText({ chosen: [{ partId: 1, mpn: 'A-1', title: '', manufacturer: 'Maker', role: 'main', s11Source: 'evaluation board' }] })).toBe(
      'A-1 (Maker)',
    );
  });
  it('names the antenna of each part when a radio has several, and where its S11 was measured', () => {
    const chosen = [
      { partId: 1, mpn: 'A-1', title: '', manufacturer: 'Maker', role: 'main' as const, s11Source: 'measured in product, file housing.s4p, port 1' },
      { partId: 2, mpn: 'B-2', title: '', manufacturer: 'Other', role: 'diversity' as const, s11Source: 'evaluation board' },
    ];
    expect(chosenPartsText({ chosen })).toBe('main: A-1 (Maker, S11 measured in product, file housing.s4p, port 1); diversity: B-2 (Other)');
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
