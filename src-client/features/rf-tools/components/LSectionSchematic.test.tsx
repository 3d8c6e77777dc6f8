import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { MatchingElement } from '../types';
import { LSectionSchematic } from './LSectionSchematic';

const element = (connection: MatchingElement['connection'], position: MatchingElement['position'], kind: MatchingElement['kind']): MatchingElement => ({
  connection,
  position,
  kind,
  inductanceNh: kind === 'inductor' ? 12 : null,
  capacitancePf: kind === 'capacitor' ? 3.3 : null,
});

describe(LSectionSchematic.name, () => {
  it('draws from the source: the API lists the load side first, so its last element comes first', () => {
    const exact = [element('shunt', 'load-side', 'capacitor'), element('series', 'source-side', 'inductor')];
    render(<LSectionSchematic exact={exact} snapped={exact} series="E12" z0Ohms={50} loadLabel="200 − j100 Ω" />);
    const parts = screen.getAllByLabelText(/side$/).map((node) => node.getAttribute('aria-label'));
    expect(parts).toEqual(['Series L, source-side', 'Shunt C, load-side']);
  });
});
