import { describe, expect, it } from 'vitest';
import { NO_FILTERS, candidateQuery, feedFitText, leadTimeText, priceText } from './candidate-words';

describe(candidateQuery.name, () => {
  it('sends the filters the server reads, lists comma-separated', () => {
    const query = candidateQuery({ formFactor: ['chip'], feed: ['SMA', 'N'], maxPrice: '1.50', maxLeadTimeDays: '28', quantity: 500, currency: 'EUR' }, 30);
    expect(query).toEqual({ limit: 30, formFactor: 'chip', feed: 'SMA,N', maxPrice: '1.50', maxLeadTimeDays: 28, quantity: 500, currency: 'EUR' });
  });
  it('leaves out a half-typed price or lead time instead of sending it', () => {
    const query = candidateQuery({ ...NO_FILTERS, maxPrice: '1.', maxLeadTimeDays: 'abc' }, 30);
    expect(query.maxPrice).toBeUndefined();
    expect(query.maxLeadTimeDays).toBeUndefined();
    expect(query.formFactor).toBeUndefined();
  });
});

describe(priceText.name, () => {
  it('shows the unit price with its currency and the quantity', () => {
    const price = { offerId: 1, supplier: 'Depot', currency: 'USD', unitPrice: '0.4211', breakQuantity: 100, leadTimeDays: 21, moq: null };
    expect(priceText(price, 250)).toContain('0.4211 USD each at 250 pcs');
    expect(leadTimeText(price)).toBe('Lead time 21 days');
    expect(priceText(null, 250)).toBe('No offer for 250 pcs');
  });
});

describe(feedFitText.name, () => {
  it('names the adapter case with both feeds', () => {
    expect(feedFitText('adapter', 'SMA', 'RP-SMA')).toBe("RP-SMA: needs an adapter or cable to the radio's SMA");
  });
});
