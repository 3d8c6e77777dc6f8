import type { Facts } from './types';

type OperatorCallback = (factValue: unknown, compareTo: unknown) => boolean;
// Like json-rules-engine, `in`/`contains` call indexOf on whatever they get (arrays once the rule is validated).
const indexIn = (container: unknown, item: unknown) => (container as { indexOf(item: unknown): number }).indexOf(item);
const ordered = (value: unknown) => value as number;

// The same callbacks and fact-value validators as json-rules-engine 7's default operators, so verdicts match.
// For a number parseFloat is the identity, so only NaN fails; the string form is json-rules-engine's own test.
const numberValidator = (factValue: unknown) =>
  typeof factValue === 'number' ? !Number.isNaN(factValue) : Number.parseFloat(factValue as string).toString() !== 'NaN';
export const OPERATORS: Record<string, { cb: OperatorCallback; validator: (factValue: unknown) => boolean }> = {
  equal: { cb: (a, b) => a === b, validator: () => true },
  notEqual: { cb: (a, b) => a !== b, validator: () => true },
  in: { cb: (a, b) => indexIn(b, a) > -1, validator: () => true },
  notIn: { cb: (a, b) => indexIn(b, a) === -1, validator: () => true },
  contains: { cb: (a, b) => indexIn(a, b) > -1, validator: Array.isArray },
  doesNotContain: { cb: (a, b) => indexIn(a, b) === -1, validator: Array.isArray },
  lessThan: { cb: (a, b) => ordered(a) < ordered(b), validator: numberValidator },
  lessThanInclusive: { cb: (a, b) => ordered(a) <= ordered(b), validator: numberValidator },
  greaterThan: { cb: (a, b) => ordered(a) > ordered(b), validator: numberValidator },
  greaterThanInclusive: { cb: (a, b) => ordered(a) >= ordered(b), validator: numberValidator },
};

/** One comparison, evaluated on the spot (no closure): for margins, which look at few leaves once. */
export function leafHolds(node: { readonly fact: string; readonly operator: string; readonly value: unknown }, facts: Facts): boolean {
  const op = OPERATORS[node.operator];
  if (!op) throw new Error(`unknown operator "${node.operator}"`);
  const value = node.value;
  const compareTo = typeof value === 'object' && value !== null && !Array.isArray(value) && 'fact' in value ? facts[(value as { fact: string }).fact] : value;
  const a = facts[node.fact];
  return op.validator(a) && op.cb(a, compareTo);
}
