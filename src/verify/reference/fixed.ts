/**
 * Exact-enough arithmetic for the reference solvers of the test kit: binary fixed point with
 * BigInt, a value being an integer count of 2^-SCALE. Every double converts exactly (doubles
 * are dyadic rationals; none in the suite is below 2^-SCALE); addition is exact and each
 * product or quotient rounds at 2^-SCALE, about 190 decimal places below the units, so even
 * systems with a condition number of 1e30 keep over 150 digits. Tests only: the functions
 * bundle never uses BigInt.
 */

export type Fixed = bigint;

export const SCALE = 640n;
const ONE_SHIFTED = 1n << SCALE;
export const ZERO: Fixed = 0n;
export const ONE: Fixed = ONE_SHIFTED;

const view = new DataView(new ArrayBuffer(8));

/** The double x exactly (throws for non-finite values or values too small for the scale). */
export function fromNumber(x: number): Fixed {
  if (!Number.isFinite(x)) throw new Error(`fixed: ${x} is not finite`);
  if (x === 0) return 0n;
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const sign = bits >> 63n ? -1n : 1n;
  const exponent = Number((bits >> 52n) & 0x7ffn);
  const fraction = bits & ((1n << 52n) - 1n);
  const mantissa = exponent === 0 ? fraction : fraction | (1n << 52n);
  const power = BigInt((exponent === 0 ? 1 : exponent) - 1075) + SCALE;
  if (power < 0n) {
    const shifted = mantissa >> -power;
    if (shifted << -power !== mantissa) throw new Error(`fixed: ${x} is below the resolution 2^-${SCALE}`);
    return sign * shifted;
  }
  return sign * (mantissa << power);
}

export function fromInteger(n: number): Fixed {
  return BigInt(n) << SCALE;
}

export function mul(a: Fixed, b: Fixed): Fixed {
  return (a * b) >> SCALE;
}

export function div(a: Fixed, b: Fixed): Fixed {
  if (b === 0n) throw new Error("fixed: division by zero");
  return (a << SCALE) / b;
}

export function pow(a: Fixed, n: number): Fixed {
  let out = ONE;
  for (let i = 0; i < n; i++) out = mul(out, a);
  return out;
}

export function abs(a: Fixed): Fixed {
  return a < 0n ? -a : a;
}

/** The nearest double (correctly rounded to within one unit in the last place). */
export function toNumber(a: Fixed): number {
  if (a === 0n) return 0;
  const negative = a < 0n;
  let m = negative ? -a : a;
  // Keep 64 significant bits, then let Number() round them.
  const bitLength = m.toString(2).length;
  let exponent = -Number(SCALE);
  if (bitLength > 64) {
    const drop = BigInt(bitLength - 64);
    m >>= drop;
    exponent += Number(drop);
  }
  const value = Number(m) * Math.pow(2, exponent);
  return negative ? -value : value;
}
