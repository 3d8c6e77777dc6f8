import { describe, expect, it } from 'vitest';
import type { ProductEvaluation } from '../types';
import { chosenRoles, firstOpenRole } from './antenna-choice';

const evaluation = {
  radios: [
    {
      radioId: 21,
      chosen: [{ partId: 1002, mpn: 'A', title: '', manufacturer: 'M', role: 'main', s11Source: 'evaluation board' }],
    },
  ],
} as unknown as Pick<ProductEvaluation, 'radios'>;

describe(chosenRoles.name, () => {
  it('maps each chosen part of the radio to its antenna, and nothing for another radio or before the evaluation loads', () => {
    expect([...chosenRoles(evaluation, 21)]).toEqual([[1002, 'main']]);
    expect(chosenRoles(evaluation, 22).size).toBe(0);
    expect(chosenRoles(undefined, 21).size).toBe(0);
  });
});

describe(firstOpenRole.name, () => {
  it('offers the first antenna without a part, else the main one', () => {
    expect(firstOpenRole(['main', 'diversity'], chosenRoles(evaluation, 21))).toBe('diversity');
    expect(firstOpenRole(['main', 'diversity'], new Map())).toBe('main');
    expect(firstOpenRole(['main'], chosenRoles(evaluation, 21))).toBe('main');
  });
});
