// The tokeniser of the equation parser (src/poly/parse.ts): characters to numbers, variable letters and
// operators, each with its 1-based column.
//
// Canonical form: "**" and superscript digits become "^" (followed by the number), the Unicode minus
// becomes "-", "·" and "×" become "*"; whitespace is dropped; the list always ends with an 'end' token
// whose column is one past the text. Numbers are exact rationals (a decimal point is exact).
import { rat, type Rational } from '../exact/rational.ts';

export type TokenKind = 'num' | 'var' | 'op' | 'end';

export interface Token {
  readonly kind: TokenKind;
  /** The operator or variable letter; digits for numbers. */
  readonly text: string;
  /** 1-based column of the first character. */
  readonly col: number;
  readonly value?: Rational;
  /** For numbers: true when written with a decimal point (refused as an exponent). */
  readonly decimal?: boolean;
}

const SUPERSCRIPTS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

export function tokenise(text: string, fail: (msg: string, col: number) => never): Token[] {
  const out: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const ch = text[i];
    const col = i + 1;
    if (ch === ' ' || ch === '\t' || ch === '\n' || ch === '\r') {
      i++;
    } else if ((ch >= '0' && ch <= '9') || ch === '.') {
      let j = i;
      while (j < text.length && text[j] >= '0' && text[j] <= '9') j++;
      const whole = text.slice(i, j);
      let frac: string | undefined;
      if (text[j] === '.') {
        let k = j + 1;
        while (k < text.length && text[k] >= '0' && text[k] <= '9') k++;
        frac = text.slice(j + 1, k);
        if (whole === '' && frac === '') fail(`expected a digit after '.'`, col);
        j = k;
        if (text[j] === '.') fail(`a number has at most one decimal point`, j + 1);
      }
      const f = frac ?? '';
      const value = rat(BigInt((whole || '0') + f), 10n ** BigInt(f.length));
      out.push({ kind: 'num', text: text.slice(i, j), col, value, decimal: frac !== undefined });
      i = j;
    } else if (SUPERSCRIPTS.includes(ch)) {
      let j = i;
      let digits = '';
      while (j < text.length && SUPERSCRIPTS.includes(text[j])) digits += SUPERSCRIPTS.indexOf(text[j++]).toString();
      out.push({ kind: 'op', text: '^', col });
      out.push({ kind: 'num', text: digits, col, value: rat(BigInt(digits)) });
      i = j;
    } else if (/[A-Za-z]/.test(ch)) {
      out.push({ kind: 'var', text: ch, col });
      i++;
    } else if (ch === '*' && text[i + 1] === '*') {
      out.push({ kind: 'op', text: '^', col });
      i += 2;
    } else if ('+-*/^()='.includes(ch)) {
      out.push({ kind: 'op', text: ch, col });
      i++;
    } else if (ch === '\u2212') {
      out.push({ kind: 'op', text: '-', col });
      i++;
    } else if (ch === '\u00b7' || ch === '\u00d7') {
      out.push({ kind: 'op', text: '*', col });
      i++;
    } else {
      fail(`unexpected character '${ch}'; expected a number, x, y (or X, Y, Z), an operator + - * / ^, '(' or ')'`, col);
    }
  }
  out.push({ kind: 'end', text: '', col: text.length + 1 });
  return out;
}
