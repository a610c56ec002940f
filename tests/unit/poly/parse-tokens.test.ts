import { describe, expect, it } from 'vitest';
import { tokenise } from '../../../src/poly/parse-tokens.ts';
import { ParseError } from '../../../src/exact/errors.ts';

const fail = (msg: string, col: number): never => {
  throw new ParseError(msg, col);
};
const shape = (text: string) => tokenise(text, fail).map((t) => `${t.kind}:${t.text}@${t.col}`);

describe('tokenise', () => {
  it('columns, exact decimals, ** and superscripts, Unicode signs, the closing end token', () => {
    expect(shape('3x**2 − y²·2')).toEqual([
      'num:3@1', 'var:x@2', 'op:^@3', 'num:2@5', 'op:-@7', 'var:y@9', 'op:^@10', 'num:2@10', 'op:*@11', 'num:2@12', 'end:@13',
    ]);
    const [t] = tokenise('0.125', fail);
    expect(t.value).toEqual({ num: 1n, den: 8n });
    expect(t.decimal).toBe(true);
    expect(tokenise('.5', fail)[0].value).toEqual({ num: 1n, den: 2n });
  });
  it('refuses stray characters and malformed numbers with their column', () => {
    expect(() => tokenise('x $ y', fail)).toThrow(expect.objectContaining({ column: 3 }));
    expect(() => tokenise('x + .', fail)).toThrow(/expected a digit after '.'/);
    expect(() => tokenise('1.2.3', fail)).toThrow(expect.objectContaining({ column: 4 }));
  });
});
