// Correctly rounded decimals of exact rationals (rounding half away from zero: common practice).
import { describe, expect, it } from 'vitest';
import { intervalToDecimal, ratToDecimal } from '../../../src/exact/decimal.ts';
import { rat } from '../../../src/exact/rational.ts';

describe('decimal display', () => {
  it('table', () => {
    expect(ratToDecimal(rat(1n, 3n), 4)).toBe('0.3333');
    expect(ratToDecimal(rat(2n, 3n), 4)).toBe('0.6667');
    expect(ratToDecimal(rat(-17n, 4n), 2)).toBe('-4.3');
    expect(ratToDecimal(rat(999n, 1000n), 2)).toBe('1.0');
    expect(ratToDecimal(rat(5n, 1n), 3)).toBe('5.00');
    expect(ratToDecimal(rat(0n), 3)).toBe('0.00');
    expect(ratToDecimal(rat(10n ** 30n + 1n, 7n), 5)).toBe('1.4286e+29');
    expect(ratToDecimal(rat(1n, 7n * 10n ** 30n), 3)).toBe('1.43e-31');
  });
  it('intervals decide only when both ends agree', () => {
    expect(intervalToDecimal(rat(14141n, 10000n), rat(14149n, 10000n), 3)).toBe('1.41');
    expect(intervalToDecimal(rat(1414n, 1000n), rat(1416n, 1000n), 3)).toBeNull();
  });
});
