import { describe, expect, it } from 'vitest';
import { describeChanges, fieldLabel } from './history-changes';

describe('history changes', () => {
  it('shows old and new values of an offer edit, price breaks included', () => {
    const lines = describeChanges('offer-updated', {
      offerId: 7,
      leadTimeDays: [28, 42],
      stock: [12000, null],
      priceBreaks: [
        [
          { quantity: 1, unitPrice: '0.95' },
          { quantity: 100, unitPrice: '0.60' },
        ],
        [{ quantity: 1, unitPrice: '0.90' }],
      ],
    }).map((l) => l.text);
    expect(lines).toEqual(['Offer: 7', 'Lead time (days): 28 → 42', 'Stock (pieces): 12000 → —', 'Price breaks: 1+ at 0.95, 100+ at 0.60 → 1+ at 0.90']);
  });

  it('shows the values of an added offer as they are, never as a before and after', () => {
    const lines = describeChanges('offer-added', {
      priceBreaks: [
        { quantity: 1, unitPrice: '0.95' },
        { quantity: 100, unitPrice: '0.60' },
      ],
    });
    expect(lines[0].text).toBe('Price breaks: 1+ at 0.95, 100+ at 0.60');
  });

  it('shows a review decision with its comment', () => {
    expect(describeChanges('approved', { reviewState: ['in-review', 'approved'], comment: 'Looks right' }).map((l) => l.text)).toEqual([
      'Review state: in-review → approved',
      'Comment: Looks right',
    ]);
  });

  it('reads the seed state as a before and after too', () => {
    expect(describeChanges('seeded-state', { reviewState: ['draft', 'in-review'] })[0].text).toBe('Review state: draft → in-review');
  });

  it('names fields in words with units', () => {
    expect(fieldLabel('evalGroundLengthMm')).toBe('Eval ground length (mm)');
    expect(fieldLabel('heightMm')).toBe('Height (mm)');
    expect(fieldLabel('title')).toBe('Title');
  });
});
