import { ValidationFailedError } from '../../common/domain-error';
import { priceAtQuantity } from '../../compatibility/sourcing/price-at-quantity';
import { normalisePriceBreaks } from './sourcing.service';

describe(normalisePriceBreaks.name, () => {
  it('sorts the breaks by quantity and keeps the lowest price exactly (ten-thousandths, no binary fractions)', () => {
    const { priceBreaks, minUnitPrice } = normalisePriceBreaks([
      { quantity: 1000, unitPrice: '0.35' },
      { quantity: 1, unitPrice: '0.90' },
      { quantity: 250, unitPrice: '0.55' },
    ]);
    expect(priceBreaks.map((b) => b.quantity)).toEqual([1, 250, 1000]);
    expect(minUnitPrice).toBe('0.3500');
  });

  it('names the repeated break as it was sent (priceBreaks.<index>.quantity)', () => {
    let error: unknown;
    try {
      normalisePriceBreaks([
        { quantity: 100, unitPrice: '0.60' },
        { quantity: 1, unitPrice: '0.95' },
        { quantity: 100, unitPrice: '0.55' },
      ]);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ValidationFailedError);
    expect((error as ValidationFailedError).fields.map((f) => f.field)).toEqual(['priceBreaks.2.quantity']);
  });

  it('feeds the price at a build quantity: the largest break not above it', () => {
    const { priceBreaks } = normalisePriceBreaks([
      { quantity: 1000, unitPrice: '0.35' },
      { quantity: 1, unitPrice: '0.90' },
      { quantity: 250, unitPrice: '0.55' },
    ]);
    const offer = { offerId: 1, partId: 1, supplier: 'A', currency: 'USD', priceBreaks, moq: null, leadTimeDays: null };
    expect([249, 250, 999, 1000].map((q) => priceAtQuantity(offer, q)?.unitPrice)).toEqual(['0.9000', '0.5500', '0.5500', '0.3500']);
  });
});
