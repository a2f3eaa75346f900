// A recursive-descent reader of the filter grammar:
//   expression = or;  or = and ("OR" and)*;  and = not ("AND" not)*;  not = "NOT" not | primary
//   primary = "(" expression ")" | value IN [..] | value NOT IN [..] | value op value
//           | value IS [NOT] NULL | value IS [NOT] EMPTY | value [NOT] EXISTS | value value TO value
//           | value [NOT] STARTS WITH value
//   value = word (letters, digits, _ - .) | 'quoted' | "quoted"
// Soft failures let the next alternative try; hard ones (after a committed keyword) end parsing.
import type { CompareOp, FilterNode, Token } from './ast';
import { FilterSyntaxError, problems } from './syntax-error';

const MAX_DEPTH = 150;
const KEYWORDS = new Set([
  'AND',
  'OR',
  'IN',
  'NOT',
  'TO',
  'EXISTS',
  'IS',
  'NULL',
  'EMPTY',
  'CONTAINS',
  'STARTS',
  'WITH',
  '_geoRadius',
  '_geoBoundingBox',
]);
const VALUE_CHAR = /[\p{L}\p{N}_.-]/u;
const SYNTAX_CHAR = /[\s()=<>!]/u;
const COMPARE_OPS: CompareOp[] = ['<=', '>=', '!=', '<', '>', '='];
const ESCAPES: Record<string, string> = {
  n: '\n',
  t: '\t',
  r: '\r',
  '0': '\0',
  b: '\b',
  f: '\f',
  '\\': '\\',
  '"': '"',
  "'": "'",
};

interface Parsed<T> {
  value: T;
  end: number;
}

class Parser {
  constructor(private readonly src: string) {}

  private error(problem: string, start: number, end: number, hard: boolean): FilterSyntaxError {
    return new FilterSyntaxError(problem, start, this.src.slice(start, end), this.src, hard);
  }

  private skipWs(pos: number): number {
    let p = pos;
    while (p < this.src.length && /\s/u.test(this.src[p] as string)) p += 1;
    return p;
  }

  private wordEnd(pos: number): number {
    let p = pos;
    while (p < this.src.length) {
      const cp = this.src.codePointAt(p) as number;
      const ch = String.fromCodePoint(cp);
      if (!VALUE_CHAR.test(ch)) break;
      p += ch.length;
    }
    return p;
  }

  private wordAt(pos: number): string {
    return this.src.slice(pos, this.wordEnd(pos));
  }

  private tillSyntax(pos: number): number {
    let p = pos;
    while (p < this.src.length && !SYNTAX_CHAR.test(this.src[p] as string)) p += 1;
    return p;
  }

  private tag(pos: number, text: string): number | null {
    return this.src.startsWith(text, pos) ? pos + text.length : null;
  }

  private spaces1(pos: number): number | null {
    const p = this.skipWs(pos);
    return p > pos ? p : null;
  }

  /** A field name or value, with the whitespace after it. */
  value(pos: number): Parsed<Token> {
    const p = this.skipWs(pos);
    const word = this.wordAt(p);
    if (['_geo', '_geoPoint', '_geoDistance'].includes(word) && this.src[p + word.length] === '(') {
      throw this.error(problems.reservedGeo(word), p, this.src.length, true);
    }
    if (['_geoRadius', '_geoBoundingBox', '_geoPolygon'].includes(word) && this.src[p + word.length] === '(') {
      throw this.error(problems.unsupported(word), p, this.src.length, true);
    }
    const quote = this.src[p];
    if (quote === '"' || quote === "'") {
      let i = p + 1;
      let escapedQuote = false;
      while (i < this.src.length && this.src[i] !== quote) {
        if (this.src[i] === '\\') {
          if (i + 1 >= this.src.length)
            throw this.error(problems.malformedValue(this.src.slice(p + 1)), p + 1, this.src.length, true);
          if (this.src[i + 1] === quote) escapedQuote = true;
          i += 2;
        } else {
          i += 1;
        }
      }
      if (i >= this.src.length) throw this.error(problems.missingClosing(this.src.slice(p), quote), p, this.src.length, true);
      let text = this.src.slice(p + 1, i);
      if (escapedQuote) text = text.replaceAll(`\\${quote}`, quote);
      const value = this.unescape(text, p + 1, i);
      return { value: { value, start: p + 1, length: i - p - 1, source: this.src }, end: this.skipWs(i + 1) };
    }
    const end = this.wordEnd(p);
    if (end === p) throw this.error(problems.expectedValue(this.src.slice(p, this.tillSyntax(p))), p, this.tillSyntax(p), false);
    if (KEYWORDS.has(word))
      throw this.error(problems.reservedValue(this.src.slice(p, this.tillSyntax(p))), p, this.tillSyntax(p), false);
    return { value: { value: word, start: p, length: end - p, source: this.src }, end: this.skipWs(end) };
  }

  private unescape(text: string, start: number, end: number): string {
    if (!text.includes('\\')) return text;
    return text.replace(/\\(u\{[0-9a-fA-F]{1,6}\}|u[0-9a-fA-F]{4}|x[0-7][0-9a-fA-F]|.)/gsu, (_, seq: string) => {
      if (seq.startsWith('u{')) return String.fromCodePoint(Number.parseInt(seq.slice(2, -1), 16));
      if (seq.startsWith('u') && seq.length === 5) return String.fromCharCode(Number.parseInt(seq.slice(1), 16));
      if (seq.startsWith('x') && seq.length === 3) return String.fromCharCode(Number.parseInt(seq.slice(1), 16));
      const replacement = ESCAPES[seq];
      if (replacement === undefined) throw this.error(problems.malformedValue(text), start, end, false);
      return replacement;
    });
  }

  private softly<T>(read: () => T): T | null {
    try {
      return read();
    } catch (error) {
      if (error instanceof FilterSyntaxError && !error.hard) return null;
      throw error;
    }
  }

  private committed<T>(read: () => T): T {
    try {
      return read();
    } catch (error) {
      throw error instanceof FilterSyntaxError ? error.hardened() : error;
    }
  }

  or(pos: number, depth: number): Parsed<FilterNode> {
    if (depth > MAX_DEPTH) throw this.error(problems.depth(), pos, this.src.length, true);
    const first = this.and(pos, depth + 1);
    const children = [first.value];
    let end = first.end;
    for (;;) {
      const p = this.skipWs(end);
      if (this.wordAt(p) !== 'OR') break;
      const next = this.committed(() => this.and(this.skipWs(p + 2), depth + 1));
      children.push(next.value);
      end = next.end;
    }
    return { value: children.length === 1 ? (children[0] as FilterNode) : { kind: 'or', children }, end };
  }

  private and(pos: number, depth: number): Parsed<FilterNode> {
    if (depth > MAX_DEPTH) throw this.error(problems.depth(), pos, this.src.length, true);
    const first = this.not(pos, depth + 1);
    const children = [first.value];
    let end = first.end;
    for (;;) {
      const p = this.skipWs(end);
      if (this.wordAt(p) !== 'AND') break;
      const next = this.committed(() => this.not(this.skipWs(p + 3), depth + 1));
      children.push(next.value);
      end = next.end;
    }
    return { value: children.length === 1 ? (children[0] as FilterNode) : { kind: 'and', children }, end };
  }

  private not(pos: number, depth: number): Parsed<FilterNode> {
    if (depth > MAX_DEPTH) throw this.error(problems.depth(), pos, this.src.length, true);
    const p = this.skipWs(pos);
    if (this.wordAt(p) === 'NOT') {
      const inner = this.committed(() => this.not(this.skipWs(p + 3), depth + 1));
      const value: FilterNode = inner.value.kind === 'not' ? inner.value.child : { kind: 'not', child: inner.value };
      return { value, end: inner.end };
    }
    return this.primary(pos, depth + 1);
  }

  private primary(pos: number, depth: number): Parsed<FilterNode> {
    if (depth > MAX_DEPTH) throw this.error(problems.depth(), pos, this.src.length, true);
    const p = this.skipWs(pos);
    if (this.src[p] === '(') {
      const inner = this.committed(() => this.or(this.skipWs(p + 1), depth + 1));
      const close = this.skipWs(inner.end);
      if (this.src[close] !== ')')
        throw this.error(problems.missingClosing(this.src.slice(pos), ')'), pos, this.src.length, true);
      return { value: inner.value, end: this.skipWs(close + 1) };
    }
    const word = this.wordAt(p);
    if (word === '_foreign' || word === '_vectors' || word === '_geoPolygon') {
      throw this.error(problems.unsupported(word), p, this.src.length, true);
    }
    const readers = [
      () => this.inList(pos, false),
      () => this.inList(pos, true),
      () => this.compare(pos),
      () => this.isCheck(pos),
      () => this.exists(pos),
      () => this.between(pos),
      () => this.textOp(pos),
    ];
    for (const read of readers) {
      const result = this.softly(read);
      if (result) return result;
    }
    try {
      this.value(pos);
    } catch (error) {
      if (error instanceof FilterSyntaxError && error.problem.includes('which is a reserved keyword')) throw error.hardened();
    }
    throw this.error(problems.invalidPrimary(this.src.slice(pos)), pos, this.src.length, false);
  }

  private inList(pos: number, negated: boolean): Parsed<FilterNode> | null {
    const field = this.value(pos);
    let p = field.end;
    if (negated) {
      if (this.wordAt(p) !== 'NOT') return null;
      p += 3;
    }
    p = this.skipWs(p);
    if (this.wordAt(p) !== 'IN') return null;
    p = this.skipWs(p + 2);
    if (this.src[p] !== '[') throw this.error(problems.inOpening(), p, this.src.length, true);
    p += 1;
    const values: Token[] = [];
    const first = this.softly(() => this.value(p));
    if (first) {
      values.push(first.value);
      p = first.end;
      for (;;) {
        const comma = this.skipWs(p);
        if (this.src[comma] !== ',') break;
        const next = this.softly(() => this.value(comma + 1));
        if (!next) break;
        values.push(next.value);
        p = next.end;
      }
      const trailing = this.skipWs(p);
      if (this.src[trailing] === ',') p = this.skipWs(trailing + 1);
    }
    const close = this.skipWs(p);
    if (this.src[close] !== ']') {
      if (close >= this.src.length) throw this.error(problems.inClosing(), p, this.src.length, true);
      let reserved = false;
      try {
        this.value(p);
      } catch (error) {
        reserved = error instanceof FilterSyntaxError && error.problem.includes('reserved keyword');
      }
      throw this.error(problems.inExpectedValue(this.src.slice(p), reserved), p, this.src.length, true);
    }
    const node: FilterNode = { kind: 'in', field: field.value, values };
    return { value: negated ? { kind: 'not', child: node } : node, end: this.skipWs(close + 1) };
  }

  private compare(pos: number): Parsed<FilterNode> | null {
    const field = this.value(pos);
    const op = COMPARE_OPS.find((o) => this.src.startsWith(o, field.end));
    if (!op) return null;
    const value = this.committed(() => this.value(field.end + op.length));
    return { value: { kind: 'compare', field: field.value, op, value: value.value }, end: value.end };
  }

  private isCheck(pos: number): Parsed<FilterNode> | null {
    const field = this.value(pos);
    let p = this.tag(field.end, 'IS');
    if (p === null) return null;
    p = this.spaces1(p);
    if (p === null) return null;
    let negated = false;
    const afterNot = this.tag(p, 'NOT');
    if (afterNot !== null) {
      const spaced = this.spaces1(afterNot);
      if (spaced === null) return null;
      negated = true;
      p = spaced;
    }
    const kind = this.tag(p, 'NULL') !== null ? 'null' : this.tag(p, 'EMPTY') !== null ? 'empty' : null;
    if (!kind) return null;
    const node: FilterNode = { kind, field: field.value };
    return { value: negated ? { kind: 'not', child: node } : node, end: p + (kind === 'null' ? 4 : 5) };
  }

  private exists(pos: number): Parsed<FilterNode> | null {
    const field = this.value(pos);
    const direct = this.tag(field.end, 'EXISTS');
    if (direct !== null) return { value: { kind: 'exists', field: field.value }, end: direct };
    const afterNot = this.tag(field.end, 'NOT');
    const spaced = afterNot === null ? null : this.spaces1(afterNot);
    const end = spaced === null ? null : this.tag(spaced, 'EXISTS');
    if (end === null) return null;
    return { value: { kind: 'not', child: { kind: 'exists', field: field.value } }, end };
  }

  private between(pos: number): Parsed<FilterNode> | null {
    const field = this.value(pos);
    const from = this.value(field.end);
    const afterTo = this.tag(from.end, 'TO');
    const spaced = afterTo === null ? null : this.spaces1(afterTo);
    if (spaced === null) return null;
    const to = this.committed(() => this.value(spaced));
    return { value: { kind: 'between', field: field.value, from: from.value, to: to.value }, end: to.end };
  }

  private textOp(pos: number): Parsed<FilterNode> | null {
    const field = this.value(pos);
    let p = field.end;
    let negated = false;
    const afterNot = this.tag(p, 'NOT');
    if (afterNot !== null) {
      const spaced = this.spaces1(afterNot);
      if (spaced === null) return null;
      negated = true;
      p = spaced;
    }
    const afterContains = this.tag(p, 'CONTAINS');
    if (afterContains !== null) {
      this.committed(() => this.value(afterContains));
      throw this.error(problems.contains(), p, afterContains, true);
    }
    const afterStarts = this.tag(p, 'STARTS WITH');
    if (afterStarts === null) return null;
    const value = this.committed(() => this.value(afterStarts));
    const node: FilterNode = { kind: 'startsWith', field: field.value, value: value.value };
    return { value: negated ? { kind: 'not', child: node } : node, end: value.end };
  }
}

/** Parses one filter expression; null for an empty one. Throws FilterSyntaxError. */
export function parseFilterExpression(source: string): FilterNode | null {
  if (source.trim() === '') return null;
  const parser = new Parser(source);
  const { value, end } = parser.or(0, 0);
  if (end < source.length) {
    throw new FilterSyntaxError(problems.expectedEof(source.slice(end)), end, source.slice(end), source, true);
  }
  return value;
}
