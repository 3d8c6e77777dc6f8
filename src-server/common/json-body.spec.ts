import { checkJsonText, MAX_JSON_DEPTH } from './json-body';

const codeOf = (text: string): string | undefined => {
  try {
    checkJsonText(text);
    return undefined;
  } catch (error) {
    return (error as { code?: string }).code;
  }
};

describe(checkJsonText.name, () => {
  it('accepts nesting up to the limit and refuses one level more', () => {
    expect(codeOf(`${'['.repeat(MAX_JSON_DEPTH)}${']'.repeat(MAX_JSON_DEPTH)}`)).toBeUndefined();
    expect(codeOf(`${'{"a":'.repeat(MAX_JSON_DEPTH + 1)}1${'}'.repeat(MAX_JSON_DEPTH + 1)}`)).toBe('JSON_TOO_DEEP');
  });

  it('checks a million levels without recursion', () => {
    expect(codeOf('['.repeat(1_000_000))).toBe('JSON_TOO_DEEP');
  });

  it('does not count brackets and quotes inside strings', () => {
    expect(codeOf(JSON.stringify({ text: '['.repeat(500), quoted: 'say \\"[[[[" here' }))).toBeUndefined();
  });

  it('refuses a lone high or low surrogate escape and accepts a pair', () => {
    expect(codeOf('{"name":"\\ud800"}')).toBe('JSON_BAD_UNICODE');
    expect(codeOf('{"name":"\\uDC00x"}')).toBe('JSON_BAD_UNICODE');
    expect(codeOf('{"name":"\\ud800\\u0041"}')).toBe('JSON_BAD_UNICODE');
    expect(codeOf('{"name":"\\ud83d\\ude00 and \\u00e9"}')).toBeUndefined();
    expect(codeOf('{"name":"\\\\ud800"}')).toBeUndefined(); // an escaped backslash, then plain text
  });

  it('leaves syntax errors to JSON.parse', () => {
    expect(codeOf('{"a":')).toBeUndefined();
    expect(codeOf('"\\u12')).toBeUndefined();
  });
});
