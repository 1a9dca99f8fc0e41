// Conversion factors against NIST Special Publication 811 (2008 edition), "Guide for the Use of
// the International System of Units (SI)", Appendix B.9 (factors for units listed by kind of
// quantity or field of science) and B.8 (alphabetical). NIST prints most factors to 7 significant
// digits (shown here as "d.ddd ddd E+nn"); factors it marks exact are checked exactly.
// The digits below were written down from memory of that table, not copied from a copy at hand;
// each also follows from the exact definitions of the inch (0.0254 m) and the pound-force
// (0.45359237 kg x 9.80665 m/s^2), which the tests in convert.test.ts check independently.
import { describe, expect, it } from "vitest";
import { Decimal } from "decimal.js";
import { conversionFactor, unitFactor } from "../../src/units/index.js";

/** The SI value of one `unit`, rounded to `digits` significant digits, in E notation as NIST prints it. */
function nist(unit: string, digits = 7): string {
  return unitFactor(unit).factor.toExponential(digits - 1).replace(/e([+-])(\d)$/, "e$10$2").toUpperCase();
}

describe("unitFactor against NIST SP 811 (2008) Appendix B", () => {
  it("lengths defined exactly", () => {
    // NIST SP 811 B.9 (length): inch (in) = 2.54 E-02 m (exact)
    expect(unitFactor("in").factor.eq("2.54e-2")).toBe(true);
    // NIST SP 811 B.9 (length): foot (ft) = 3.048 E-01 m (exact)
    expect(unitFactor("ft").factor.eq("3.048e-1")).toBe(true);
    // NIST SP 811 B.9 (length): yard (yd) = 9.144 E-01 m (exact)
    expect(unitFactor("yd").factor.eq("9.144e-1")).toBe(true);
  });

  it("areas, section moduli and second moments of area", () => {
    // NIST SP 811 B.9 (area): square inch (in^2) = 6.4516 E-04 m^2 (exact)
    expect(unitFactor("in^2").factor.eq("6.4516e-4")).toBe(true);
    // NIST SP 811 B.9 (area): square foot (ft^2) = 9.290 304 E-02 m^2 (exact)
    expect(unitFactor("ft^2").factor.eq("9.290304e-2")).toBe(true);
    // NIST SP 811 B.9 (volume; also section modulus): cubic inch (in^3) = 1.638 706 4 E-05 m^3 (exact)
    expect(unitFactor("in^3").factor.eq("1.6387064e-5")).toBe(true);
    // NIST SP 811 B.9 (second moment of area): inch to the fourth power (in^4) = 4.162 314 E-07 m^4
    expect(nist("in^4")).toBe("4.162314E-07");
    // NIST SP 811 B.9 (second moment of area): foot to the fourth power (ft^4) = 8.630 975 E-03 m^4
    expect(nist("ft^4")).toBe("8.630975E-03");
  });

  it("forces", () => {
    // NIST SP 811 B.9 (force): pound-force (lbf) = 4.448 222 E+00 N
    expect(nist("lbf")).toBe("4.448222E+00");
    // NIST SP 811 B.9 (force): kip (1 kip = 1000 lbf) = 4.448 222 E+03 N
    expect(nist("kip")).toBe("4.448222E+03");
    // NIST SP 811 B.8, footnote to pound-force: the lbf is 0.45359237 kg x 9.80665 m/s^2 exactly
    expect(unitFactor("lbf").factor.eq(new Decimal("0.45359237").times("9.80665"))).toBe(true);
  });

  it("force per length", () => {
    // NIST SP 811 B.9 (force divided by length): pound-force per foot (lbf/ft) = 1.459 390 E+01 N/m
    expect(nist("lbf/ft")).toBe("1.459390E+01");
    // NIST SP 811 B.9 (force divided by length): pound-force per inch (lbf/in) = 1.751 268 E+02 N/m
    expect(nist("lbf/in")).toBe("1.751268E+02");
  });

  it("moments of force", () => {
    // NIST SP 811 B.9 (moment of force, torque): pound-force foot (lbf*ft) = 1.355 818 E+00 N*m
    expect(nist("lbf*ft")).toBe("1.355818E+00");
    // NIST SP 811 B.9 (moment of force, torque): pound-force inch (lbf*in) = 1.129 848 E-01 N*m
    expect(nist("lbf*in")).toBe("1.129848E-01");
    // kip*ft = 1000 lbf*ft (definition of the kip, NIST SP 811 B.8): 1.355 818 E+03 N*m
    expect(nist("kip*ft")).toBe("1.355818E+03");
  });

  it("pressures and stresses", () => {
    // NIST SP 811 B.9 (pressure, stress): pound-force per square inch (psi) = 6.894 757 E+03 Pa
    expect(nist("psi")).toBe("6.894757E+03");
    // NIST SP 811 B.9 (pressure, stress): kip per square inch (ksi) = 6.894 757 E+06 Pa
    expect(nist("ksi")).toBe("6.894757E+06");
    // NIST SP 811 B.9 (pressure, stress): pound-force per square foot (lbf/ft^2) = 4.788 026 E+01 Pa
    expect(nist("psf")).toBe("4.788026E+01");
    expect(nist("lbf/ft^2")).toBe("4.788026E+01");
    // NIST SP 811 B.9: psi = 6.894 757 E+00 kPa; ksi = 6.894 757 E+03 kPa (same digits, other unit)
    expect(new Decimal(conversionFactor("psi", "kPa")).toSignificantDigits(7).toString()).toBe("6.894757");
    expect(new Decimal(conversionFactor("ksi", "MPa")).toSignificantDigits(7).toString()).toBe("6.894757");
  });

  it("SI prefixes are exact powers of ten (NIST SP 811 (2008) Table 5)", () => {
    expect(unitFactor("mm").factor.eq("0.001")).toBe(true);
    expect(unitFactor("kN").factor.eq("1000")).toBe(true);
    expect(unitFactor("GPa").factor.eq("1e9")).toBe(true);
    expect(unitFactor("N/mm^2").factor.eq(unitFactor("MPa").factor)).toBe(true);
    expect(unitFactor("mm^4").factor.eq("1e-12")).toBe(true);
  });
});
