import { describe, expect, it } from 'vitest';
import { CANDIDATE_PARAMS, NO_FILTERS, filtersFromParams, withFilterParams, withoutCandidateParams } from './candidate-words';

describe('candidate filters in the page address', () => {
  it('round-trips every filter and leaves out what equals no filter', () => {
    const filters = {
      formFactor: ['chip' as const],
      feed: ['SMA' as const, 'solder-pad' as const],
      maxPrice: '1.50',
      maxLeadTimeDays: '30',
      quantity: 1000,
      currency: 'EUR',
    };
    const params = withFilterParams(new URLSearchParams('parts=chosen'), filters);
    expect(filtersFromParams(params)).toEqual(filters);
    expect(params.get('parts')).toBe('chosen');
    expect([...withFilterParams(new URLSearchParams(), NO_FILTERS).keys()]).toEqual([]);
  });

  it('falls back to no filter for an unreadable quantity, and closing forgets radio and filters but keeps the rest', () => {
    expect(filtersFromParams(new URLSearchParams(`${CANDIDATE_PARAMS.quantity}=abc`)).quantity).toBe(1);
    const open = new URLSearchParams(`parts=chosen&${CANDIDATE_PARAMS.radio}=13&${CANDIDATE_PARAMS.maxPrice}=2`);
    expect(withoutCandidateParams(open).toString()).toBe('parts=chosen');
  });
});
