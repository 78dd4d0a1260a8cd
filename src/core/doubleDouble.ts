/**
 * Double-double arithmetic: a value is an unevaluated sum hi + lo of two doubles with
 * |lo| <= ulp(hi)/2, about 106 bits (32 digits). Error-free transformations after Knuth
 * (two-sum) and Dekker (two-product by Veltkamp splitting, so no fused multiply-add is
 * needed and the bundle stays ES2016); the compound operations follow Hida, Li and Bailey,
 * "Library for double-double and quad-double arithmetic" (2007), sections 3-4 (from memory).
 * Used only where the stiffness system is too ill-conditioned for double precision.
 */

/** A double-double number. */
export interface DD {
  hi: number;
  lo: number;
}

const SPLITTER = 134217729; // 2^27 + 1

export function dd(value: number): DD {
  return { hi: value, lo: 0 };
}

function quickTwoSum(a: number, b: number): DD {
  const s = a + b;
  return { hi: s, lo: b - (s - a) };
}

/** a + b exactly, as a double-double. */
export function twoSum(a: number, b: number): DD {
  const s = a + b;
  const v = s - a;
  return { hi: s, lo: a - (s - v) + (b - v) };
}

/** The high half of a (Veltkamp's split, 26 bits); the low half is a - highPart(a), exactly. */
export function highPart(a: number): number {
  const ca = SPLITTER * a;
  return ca - (ca - a);
}

/**
 * The rounding error of p = a * b from the halves of a (ah, al) and b (bh, bl), so that a
 * factor used in several products is split once: the same operations as productError.
 */
export function splitProductError(ah: number, al: number, bh: number, bl: number, p: number): number {
  return ah * bh - p + ah * bl + al * bh + al * bl;
}

/** The rounding error of the product p = a * b (Dekker's split): a * b = p + productError(a, b, p) exactly. No allocation. */
export function productError(a: number, b: number, p: number): number {
  const ah = highPart(a);
  const bh = highPart(b);
  return splitProductError(ah, a - ah, bh, b - bh, p);
}

/** a * b exactly, as a double-double (Dekker). */
export function twoProduct(a: number, b: number): DD {
  const p = a * b;
  return { hi: p, lo: productError(a, b, p) };
}

export function add(x: DD, y: DD): DD {
  const s = twoSum(x.hi, y.hi);
  const t = twoSum(x.lo, y.lo);
  const u = quickTwoSum(s.hi, s.lo + t.hi);
  return quickTwoSum(u.hi, u.lo + t.lo);
}

export function neg(x: DD): DD {
  return { hi: -x.hi, lo: -x.lo };
}

export function sub(x: DD, y: DD): DD {
  return add(x, neg(y));
}

export function mul(x: DD, y: DD): DD {
  const p = twoProduct(x.hi, y.hi);
  return quickTwoSum(p.hi, p.lo + (x.hi * y.lo + x.lo * y.hi));
}

export function mulNumber(x: DD, b: number): DD {
  const p = twoProduct(x.hi, b);
  return quickTwoSum(p.hi, p.lo + x.lo * b);
}

export function div(x: DD, y: DD): DD {
  const q1 = x.hi / y.hi;
  let r = sub(x, mulNumber(y, q1));
  const q2 = r.hi / y.hi;
  r = sub(r, mulNumber(y, q2));
  const q3 = r.hi / y.hi;
  return add(quickTwoSum(q1, q2), dd(q3));
}

/** Square root by one Newton step from the double root. */
export function sqrt(x: DD): DD {
  if (x.hi <= 0) return dd(x.hi === 0 ? 0 : NaN);
  const r = Math.sqrt(x.hi);
  const correction = sub(x, twoProduct(r, r)).hi / (2 * r);
  return twoSum(r, correction);
}

/** The nearest double. */
export function toNumber(x: DD): number {
  return x.hi + x.lo;
}
