import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import {
  invalidateAssignment,
  invalidateInProduct,
  invalidatePart,
  invalidateRadio,
  invalidateRegulatoryLimits,
  invalidateRules,
  invalidateUsers,
  invalidateVerdicts,
} from './invalidation';
import { bandKeys, candidateKeys, inProductKeys, matrixKeys, partKeys, productKeys, regulatoryLimitKeys, ruleKeys, userKeys } from './query-keys';

/** A cache holding one entry under each key a page may show, all fresh. */
function filledCache() {
  const queryClient = new QueryClient();
  const keys = {
    product7: productKeys.detail(7),
    product8: productKeys.detail(8),
    productList: productKeys.list(),
    history7: productKeys.history(7),
    matrix7: matrixKeys.product(7),
    matrix8: matrixKeys.product(8),
    candidates7: candidateKeys.radio(7, 70),
    candidates8: candidateKeys.radio(8, 80),
    inProductFiles7: inProductKeys.list(7),
    isolation7: inProductKeys.isolation(7),
    isolation8: inProductKeys.isolation(8),
    part5: partKeys.detail(5),
    part5Ranges: partKeys.detail(5, '791-862'),
    part6: partKeys.detail(6),
    points5: partKeys.points(5, 50),
    search: partKeys.search({ q: 'chip' }),
    queue: partKeys.reviewQueue(),
    bands: bandKeys.list(),
    limits: regulatoryLimitKeys.list(),
    rules: ruleKeys.list(),
    rule: ruleKeys.detail('vswr-in-band'),
    users: userKeys.list(),
  };
  for (const key of Object.values(keys)) queryClient.setQueryData(key, { cached: true });
  const stale = () =>
    Object.entries(keys)
      .filter(([, key]) => queryClient.getQueryState(key)?.isInvalidated)
      .map(([name]) => name)
      .sort();
  return { queryClient, stale };
}

describe(invalidateRadio.name, () => {
  it("marks stale the product, its history, the list, and that product's matrix, candidates and in-product data only", async () => {
    const { queryClient, stale } = filledCache();
    await invalidateRadio(queryClient, 7);
    expect(stale()).toEqual(['candidates7', 'history7', 'inProductFiles7', 'isolation7', 'matrix7', 'product7', 'productList']);
  });
});

describe(invalidateInProduct.name, () => {
  it("marks stale that product's files, isolation, history and verdicts, not its candidates or another product", async () => {
    const { queryClient, stale } = filledCache();
    await invalidateInProduct(queryClient, 7);
    expect(stale()).toEqual(['history7', 'inProductFiles7', 'isolation7', 'matrix7']);
  });
});

describe(invalidatePart.name, () => {
  it('marks stale the part under every range choice, searches, the queue and every verdict, not other parts or curves', async () => {
    const { queryClient, stale } = filledCache();
    await invalidatePart(queryClient, 5);
    expect(stale()).toEqual(['candidates7', 'candidates8', 'matrix7', 'matrix8', 'part5', 'part5Ranges', 'queue', 'search']);
  });
});

describe(invalidateAssignment.name, () => {
  it("marks stale that product's matrix and candidates", async () => {
    const { queryClient, stale } = filledCache();
    await invalidateAssignment(queryClient, 8);
    expect(stale()).toEqual(['candidates8', 'matrix8']);
  });
});

describe(invalidateVerdicts.name, () => {
  it('marks every matrix and candidate list stale', async () => {
    const { queryClient, stale } = filledCache();
    await invalidateVerdicts(queryClient);
    expect(stale()).toEqual(['candidates7', 'candidates8', 'matrix7', 'matrix8']);
  });
});

describe(invalidateRules.name, () => {
  it('marks stale the rules and every verdict', async () => {
    const { queryClient, stale } = filledCache();
    await invalidateRules(queryClient);
    expect(stale()).toEqual(['candidates7', 'candidates8', 'matrix7', 'matrix8', 'rule', 'rules']);
  });
});

describe(invalidateRegulatoryLimits.name, () => {
  it('marks stale the limits and every verdict, since the EIRP rules compare against them', async () => {
    const { queryClient, stale } = filledCache();
    await invalidateRegulatoryLimits(queryClient);
    expect(stale()).toEqual(['candidates7', 'candidates8', 'limits', 'matrix7', 'matrix8']);
  });
});

describe(invalidateUsers.name, () => {
  it('marks stale the user list only', async () => {
    const { queryClient, stale } = filledCache();
    await invalidateUsers(queryClient);
    expect(stale()).toEqual(['users']);
  });
});
