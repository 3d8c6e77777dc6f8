import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import ret, { types, type Tokens } from 'ret';
import * as ts from 'typescript';

const SERVER_ROOT = join(__dirname, '..');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return entry.name.endsWith('.ts') ? [path] : [];
  });
}

/**
 * Star height counting only unbounded repetition (`*`, `+`, `{n,}`): above 1 a regex can backtrack
 * exponentially. safe-regex2 (same parser, `ret`) also counts `?` and `{0,1}`, which flags harmless
 * patterns like `\d+(\.\d+)?`; this keeps its idea with that one difference.
 */
export function unboundedStarHeight(source: string): number {
  const height = (token: Tokens, depth: number): number => {
    let own = depth;
    let inner = depth;
    if (token.type === types.REPETITION) {
      own = token.max === Infinity ? depth + 1 : depth;
      return Math.max(own, height(token.value, own));
    }
    const node = token as { stack?: Tokens[]; options?: Tokens[][] };
    for (const child of node.stack ?? []) inner = Math.max(inner, height(child, depth));
    for (const option of node.options ?? []) for (const child of option) inner = Math.max(inner, height(child, depth));
    return Math.max(own, inner);
  };
  return height(ret(source), 0);
}

interface FoundRegex {
  where: string;
  source: string | null;
}

/** Every regex literal and `new RegExp(…)`/`RegExp(…)` call in a file; a non-literal pattern has source null. */
function regexesIn(path: string): FoundRegex[] {
  const text = readFileSync(path, 'utf8');
  const file = ts.createSourceFile(path, text, ts.ScriptTarget.Latest, true);
  const found: FoundRegex[] = [];
  const where = (node: ts.Node) => `${relative(SERVER_ROOT, path)}:${file.getLineAndCharacterOfPosition(node.getStart()).line + 1}`;
  const visit = (node: ts.Node) => {
    if (node.kind === ts.SyntaxKind.RegularExpressionLiteral) {
      const literal = (node as ts.RegularExpressionLiteral).text;
      found.push({ where: where(node), source: literal.slice(1, literal.lastIndexOf('/')) });
    } else if ((ts.isNewExpression(node) || ts.isCallExpression(node)) && ts.isIdentifier(node.expression) && node.expression.text === 'RegExp') {
      const first = node.arguments?.[0];
      found.push({ where: where(node), source: first && ts.isStringLiteralLike(first) ? first.text : null });
    }
    ts.forEachChild(node, visit);
  };
  visit(file);
  return found;
}

describe('regular expressions in the server', () => {
  const all = sourceFiles(SERVER_ROOT).flatMap(regexesIn);

  it('finds the regexes it checks (the scan itself works)', () => {
    expect(all.length).toBeGreaterThan(20);
  });

  it('has no nested unbounded repetition (star height above 1), which can backtrack catastrophically', () => {
    const unsafe = all.filter((r) => r.source !== null && unboundedStarHeight(r.source) > 1).map((r) => `${r.where} /${r.source}/`);
    expect(unsafe).toEqual([]);
  });

  it('builds no RegExp from a non-literal pattern, which this check could not see', () => {
    expect(all.filter((r) => r.source === null).map((r) => r.where)).toEqual([]);
  });

  it('flags the kind of pattern it is meant to catch, and not a bounded optional group', () => {
    // Strings, not literals, so the scan above does not find these on purpose.
    expect(unboundedStarHeight('^(<!--[\\s\\S]*?-->\\s*)*<svg')).toBe(2);
    expect(unboundedStarHeight('(a+)+b')).toBe(2);
    expect(unboundedStarHeight('(?:x|y\\d{2,})*z')).toBe(2);
    expect(unboundedStarHeight('^(\\d+(?:\\.\\d+)?)-(\\d+(?:\\.\\d+)?)$')).toBe(1);
    expect(unboundedStarHeight('^abc$')).toBe(0);
  });
});
