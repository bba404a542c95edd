import { describe, expect, it } from "vitest";
import { decimalContext } from "@/cas/numeric/evaluate";
import { DD, ddAdd, ddDiv, ddFromDecimal, ddMul, ddOf, ddPowInt, ddSinCos, ddSqrt, ddSub, ddToDecimal } from "@/cas/numeric/double-double";
import { randomSource } from "@/cas/simplify/probe";

// Reference values: decimal.js at 50 digits (the arithmetic the checker already trusts).
const D = decimalContext(50);
const dec = (x: DD) => ddToDecimal(D, x);
const relativeError = (got: DD, want: ReturnType<typeof dec>) => dec(got).minus(want).abs().div(want.abs().isZero() ? 1 : want.abs()).toNumber();

describe("double-double arithmetic", () => {
  const next = randomSource(3);
  const samples = Array.from({ length: 200 }, () => new D((next() - 0.5) * 50).toDecimalPlaces(20)).filter((x) => !x.isZero());

  it("carries a decimal value to ~1e-32 and back", () => {
    for (const x of samples) expect(relativeError(ddFromDecimal(D, x), x)).toBeLessThan(1e-31);
    // 0.1 is not a binary fraction: hi alone would be off by 5.5e-18 (IEEE 754 rounding of 0.1).
    expect(relativeError(ddFromDecimal(D, new D("0.1")), new D("0.1"))).toBeLessThan(1e-31);
  });

  it("adds, subtracts, multiplies, divides and takes roots to ~1e-31 relative", () => {
    for (let i = 0; i + 1 < samples.length; i += 2) {
      const [x, y] = [samples[i], samples[i + 1]];
      const [a, b] = [ddFromDecimal(D, x), ddFromDecimal(D, y)];
      const [xa, yb] = [dec(a), dec(b)]; // the inputs as they are held, so only the operation's rounding is measured
      // Sums and differences are accurate relative to the operands (a cancelling difference keeps absolute accuracy).
      const size = xa.abs().plus(yb.abs());
      expect(dec(ddAdd(a, b)).minus(xa.plus(yb)).abs().div(size).toNumber()).toBeLessThan(1e-31);
      expect(dec(ddSub(a, b)).minus(xa.minus(yb)).abs().div(size).toNumber()).toBeLessThan(1e-31);
      expect(relativeError(ddMul(a, b), xa.times(yb))).toBeLessThan(1e-31);
      expect(relativeError(ddDiv(a, b), xa.div(yb))).toBeLessThan(1e-31);
      expect(relativeError(ddSqrt(ddMul(a, a)), xa.abs())).toBeLessThan(1e-31);
      expect(relativeError(ddPowInt(a, -7), xa.pow(-7))).toBeLessThan(1e-30);
    }
  });

  it("computes sin and cos to ~1e-31 for moderate arguments and declines beyond 10^6", () => {
    for (const x of samples) {
      const a = ddFromDecimal(D, x);
      const sc = ddSinCos(a)!;
      expect(dec(sc.sin).minus(dec(a).sin()).abs().toNumber()).toBeLessThan(1e-30);
      expect(dec(sc.cos).minus(dec(a).cos()).abs().toNumber()).toBeLessThan(1e-30);
    }
    expect(ddSinCos(ddOf(2e6))).toBeNull();
  });
});
