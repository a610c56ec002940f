// The integer gcd kernel. Everything exact calls `gcd` from here and nowhere else, so the kernel can be
// swapped by measurement (tests/bench) without touching callers.
//
// Canonical form: gcd(a, b) >= 0, gcd(0, 0) = 0.

export function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) {
    const r = a % b;
    a = b;
    b = r;
  }
  return a;
}
