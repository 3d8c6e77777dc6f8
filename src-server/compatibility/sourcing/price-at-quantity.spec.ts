import { bestOffer, priceAtQuantity, totalsByCurrency, type OfferInput } from './price-at-quantity';

const offer = (overrides: Partial<OfferInput> = {}): OfferInput => ({
  offerId: 1,
  partId: 7,
  supplier: 'A',
  currency: 'USD',
  priceBreaks: [
    { quantity: 10, unitPrice: '1.00' },
    { quantity: 100, unitPrice: '0.8' },
    { quantity: 1000, unitPrice: '0.5000' },
  ],
  moq: null,
  leadTimeDays: 20,
  ...overrides,
});

describe(priceAtQuantity.name, () => {
  it.each([
    [9, null],
    [10, ['1.0000', 10]],
    [11, ['1.0000', 10]],
    [99, ['1.0000', 10]],
    [100, ['0.8000', 100]],
    [101, ['0.8000', 100]],
    [999, ['0.8000', 100]],
    [1000, ['0.5000', 1000]],
    [1_000_000, ['0.5000', 1000]],
  ])('at %i pieces takes the largest break not above it', (quantity, expected) => {
    const priced = priceAtQuantity(offer(), quantity);
    expect(priced && [priced.unitPrice, priced.breakQuantity]).toEqual(expected);
  });

  it('refuses a quantity below the minimum order, whatever the breaks', () => {
    expect(priceAtQuantity(offer({ moq: 500 }), 499)).toBeNull();
    expect(priceAtQuantity(offer({ moq: 500 }), 500)).toMatchObject({ unitPrice: '0.8000', breakQuantity: 100 });
  });

  it('reads breaks in any order', () => {
    const shuffled = offer({ priceBreaks: [...offer().priceBreaks].reverse() });
    expect(priceAtQuantity(shuffled, 150)).toMatchObject({ unitPrice: '0.8000', breakQuantity: 100 });
  });
});

describe(bestOffer.name, () => {
  const offers = [
    offer({ offerId: 1 }),
    offer({ offerId: 2, currency: 'EUR', priceBreaks: [{ quantity: 1, unitPrice: '0.1000' }], leadTimeDays: 90 }),
    offer({ offerId: 3, priceBreaks: [{ quantity: 1, unitPrice: '0.7000' }], moq: 500, leadTimeDays: 5 }),
    offer({ offerId: 4, priceBreaks: [{ quantity: 1, unitPrice: '0.8000' }], leadTimeDays: 3 }),
  ];

  it('takes the cheapest usable offer in the preferred currency, the shorter lead time on a tie', () => {
    expect(bestOffer(offers, 50, 'USD')).toMatchObject({ offerId: 4, unitPrice: '0.8000' });
    expect(bestOffer(offers, 100, 'USD')).toMatchObject({ offerId: 4, leadTimeDays: 3 });
    expect(bestOffer(offers, 500, 'USD')).toMatchObject({ offerId: 3, unitPrice: '0.7000' });
    expect(bestOffer(offers, 1000, 'USD')).toMatchObject({ offerId: 1, unitPrice: '0.5000' });
    expect(bestOffer(offers, 50, 'EUR')).toMatchObject({ offerId: 2 });
  });

  it('falls back to another currency when none in the preferred one can supply the quantity', () => {
    expect(bestOffer([offers[1]], 5, 'USD')).toMatchObject({ offerId: 2, currency: 'EUR' });
    expect(bestOffer([offers[0]], 5, 'USD')).toBeNull();
  });

  it('leaves out offers over the price (only in its currency) or the lead time', () => {
    expect(bestOffer(offers, 1000, 'USD', { maxUnitPrice: '0.4999' })).toBeNull();
    expect(bestOffer(offers, 1000, 'USD', { maxUnitPrice: '0.5' })).toMatchObject({ offerId: 1 });
    expect(bestOffer(offers, 1000, 'USD', { maxLeadTimeDays: 10 })).toMatchObject({ offerId: 3 });
    expect(bestOffer(offers, 50, 'EUR', { maxUnitPrice: '0.2', maxLeadTimeDays: 30 })).toBeNull();
  });
});

describe(totalsByCurrency.name, () => {
  it('adds exact decimals per currency (0.1 + 0.2 is 0.3, never 0.30000000000000004)', () => {
    expect(
      totalsByCurrency([
        { currency: 'USD', unitPrice: '0.1', count: 1 },
        { currency: 'USD', unitPrice: '0.2', count: 1 },
        { currency: 'EUR', unitPrice: '0.3333', count: 3 },
      ]),
    ).toEqual([
      { currency: 'EUR', total: '0.9999' },
      { currency: 'USD', total: '0.3000' },
    ]);
  });
});
