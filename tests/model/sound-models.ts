// Physically sound members (stable supports, loads on the member), described in SI base units and
// written as model files in any unit system, so that the same member can be read in SI and US units.
import { fc } from "@fast-check/vitest";
import { convert, unitSystems, type UnitSystemName } from "../../src/units/index.js";

/** A member in SI base units (m, N, Pa, m^4, N/m). */
export interface PhysicalMember {
  readonly length: number;
  readonly E: number;
  readonly I: number;
  readonly supports: readonly { readonly type: "pin" | "roller" | "fixed" | "spring"; readonly at: number; readonly stiffness?: number }[];
  readonly loads: readonly (
    | { readonly type: "point" | "moment"; readonly at: number; readonly value: number }
    | { readonly type: "distributed"; readonly from: number; readonly to: number; readonly start: number; readonly end: number }
  )[];
}

const layouts = ["simple", "overhang", "cantilever", "propped", "continuous", "spring"] as const;

export const physicalMember: fc.Arbitrary<PhysicalMember> = fc
  .record({
    length: fc.double({ min: 2, max: 12, noNaN: true }),
    E: fc.double({ min: 1e10, max: 2.1e11, noNaN: true }),
    I: fc.double({ min: 1e-6, max: 1e-3, noNaN: true }),
    layout: fc.constantFrom(...layouts),
    loads: fc.array(
      fc.record({
        type: fc.constantFrom("point", "moment", "distributed"),
        a: fc.integer({ min: 0, max: 1000 }).map((n) => n / 1000),
        b: fc.integer({ min: 0, max: 1000 }).map((n) => n / 1000),
        v: fc.integer({ min: -50000, max: 50000 }),
        w: fc.integer({ min: -50000, max: 50000 }),
      }),
      { minLength: 1, maxLength: 3 },
    ),
  })
  .map(({ length, E, I, layout, loads }) => {
    const L = length;
    const supports: PhysicalMember["supports"] = {
      simple: [{ type: "pin", at: 0 }, { type: "roller", at: L }],
      overhang: [{ type: "pin", at: 0 }, { type: "roller", at: 0.7 * L }],
      cantilever: [{ type: "fixed", at: 0 }],
      propped: [{ type: "fixed", at: 0 }, { type: "roller", at: L }],
      continuous: [{ type: "pin", at: 0 }, { type: "roller", at: 0.5 * L }, { type: "roller", at: L }],
      spring: [{ type: "pin", at: 0 }, { type: "roller", at: L }, { type: "spring", at: 0.5 * L, stiffness: (48 * E * I) / L ** 3 }],
    }[layout] as PhysicalMember["supports"];
    const out = loads.map((l): PhysicalMember["loads"][number] => {
      if (l.type === "distributed") {
        const [from, to] = [Math.min(l.a, l.b) * L, Math.max(l.a, l.b) * L];
        return to - from > 0.05 * L ? { type: "distributed", from, to, start: l.v / 5, end: l.w / 5 } : { type: "point", at: from, value: l.v };
      }
      return { type: l.type, at: l.a * L, value: l.type === "moment" ? l.v * 0.5 : l.v };
    });
    return { length: L, E, I, supports, loads: out };
  });

/** Writes `member` as a model file in a unit-system preset, every number plain in those units. */
export function writeMember(member: PhysicalMember, system: UnitSystemName): Record<string, unknown> {
  const u = unitSystems[system];
  const c = (value: number, from: string, to: string): number => convert(value, from, to);
  const len = (x: number): number => c(x, "m", u.length);
  return {
    units: { system },
    length: len(member.length),
    E: c(member.E, "Pa", u.modulus),
    I: c(member.I, "m^4", u.secondMoment),
    supports: member.supports.map((s) => ({ ...s, at: len(s.at), ...(s.stiffness === undefined ? {} : { stiffness: c(s.stiffness, "N/m", u.translationalStiffness) }) })),
    loads: member.loads.map((l) =>
      l.type === "distributed"
        ? { ...l, from: len(l.from), to: len(l.to), start: c(l.start, "N/m", u.forcePerLength), end: c(l.end, "N/m", u.forcePerLength) }
        : { ...l, at: len(l.at), value: l.type === "point" ? c(l.value, "N", u.force) : c(l.value, "N*m", u.moment) },
    ),
    limits: { deflection: "span/360" },
  };
}

/** Writes `member` in SI base units with every quantity as a string carrying its unit. */
export function writeMemberWithUnits(member: PhysicalMember): Record<string, unknown> {
  return {
    length: `${member.length} m`,
    E: `${member.E} Pa`,
    I: `${member.I} m^4`,
    supports: member.supports.map((s) => ({ ...s, at: `${s.at} m`, ...(s.stiffness === undefined ? {} : { stiffness: `${s.stiffness} N/m` }) })),
    loads: member.loads.map((l) =>
      l.type === "distributed"
        ? { ...l, from: `${l.from} m`, to: `${l.to} m`, start: `${l.start} N/m`, end: `${l.end} N/m` }
        : { ...l, at: `${l.at} m`, value: `${l.value} ${l.type === "point" ? "N" : "N*m"}` },
    ),
  };
}

/** The example model of the format's specification (docs/model-format.md), as a plain object. */
export const specExample = {
  units: { length: "m", force: "kN", deflection: "mm", stress: "MPa" },
  length: 9,
  E: "200 GPa",
  I: "120000000 mm^4",
  supports: [
    { at: 0, type: "pin" },
    { at: 4, type: "spring", stiffness: "5000 kN/m" },
    { at: 7.5, type: "roller", settlement: "5 mm" },
  ],
  hinges: [],
  loads: [
    { type: "point", at: 2, value: 18, case: "dead" },
    { type: "moment", at: 9, value: 4 },
    { type: "distributed", from: 0, to: 9, start: 3, end: 5, case: "live" },
  ],
  limits: { deflection: "span/360", bendingStress: "165 MPa", shearStress: "95 MPa" },
};
