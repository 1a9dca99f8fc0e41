// Fuzzing the typed entry points: valid input with one leaf replaced by a hostile value (wrong types,
// non-finite and extreme numbers, hostile keys, deep nesting, frozen objects, proxies) or a stray key added,
// plus wholly wrong arguments. Each call must satisfy the contract in harness.ts. The budget is short and
// seed-fixed in `npm test`; `npm run fuzz` runs a long one and prints the counts.
import { fc, test } from "@fast-check/vitest";
import { afterAll, describe, expect } from "vitest";
import { solveBeam, type BeamInput } from "../../src/beam/index.js";
import { checkMember } from "../../src/check/index.js";
import { channel, circle, iSection, pipe, rectangle, rectangularHollow, section, sectionProperties, tee } from "../../src/section/index.js";
import { extremeBendingStresses } from "../../src/stress/index.js";
import { convert, parseQuantity } from "../../src/units/index.js";
import { corrupted, expectContract, FUZZ_RUNS, hostile, tally } from "./harness.js";

const runs = { numRuns: FUZZ_RUNS };
const size = fc.integer({ min: 1, max: 400 });

const simpleMember: fc.Arbitrary<BeamInput> = fc
  .record({ length: fc.integer({ min: 1, max: 20 }), ei: fc.integer({ min: 1, max: 1e6 }), at: fc.integer({ min: 0, max: 64 }), p: fc.integer({ min: -50, max: 50 }), w: fc.integer({ min: -20, max: 20 }) })
  .map(({ length, ei, at, p, w }) => ({
    length,
    stiffness: ei,
    supports: [{ kind: "pin" as const, at: 0 }, { kind: "roller" as const, at: length }],
    loads: [
      { kind: "point" as const, at: (at * length) / 64, value: p },
      { kind: "distributed" as const, from: 0, to: length, start: w, end: w / 2 },
    ],
  }));

describe("fuzz: beam", () => {
  test.prop([corrupted(simpleMember)], runs)("solveBeam on a corrupted member: a finite result or a typed error", (input) => {
    expectContract(input, (i) => solveBeam(i as BeamInput));
  });
  test.prop([hostile], runs)("solveBeam on a wholly wrong argument: a typed error", (input) => {
    expectContract(input, (i) => solveBeam(i as BeamInput));
  });
});

const shapes = fc.oneof(
  fc.record({ shape: fc.constant("rectangle"), dims: fc.record({ width: size, depth: size }) }),
  fc.record({ shape: fc.constant("circle"), dims: fc.record({ diameter: size }) }),
  fc.record({ shape: fc.constant("pipe"), dims: fc.record({ outsideDiameter: fc.integer({ min: 50, max: 400 }), wallThickness: fc.integer({ min: 1, max: 20 }) }) }),
  fc.record({ shape: fc.constant("iSection"), dims: fc.record({ depth: fc.integer({ min: 100, max: 600 }), flangeWidth: fc.integer({ min: 60, max: 300 }), flangeThickness: fc.integer({ min: 4, max: 30 }), webThickness: fc.integer({ min: 3, max: 20 }) }) }),
  fc.record({ shape: fc.constant("tee"), dims: fc.record({ depth: fc.integer({ min: 60, max: 300 }), flangeWidth: fc.integer({ min: 60, max: 300 }), flangeThickness: fc.integer({ min: 4, max: 30 }), webThickness: fc.integer({ min: 3, max: 20 }) }) }),
  fc.record({ shape: fc.constant("channel"), dims: fc.record({ depth: fc.integer({ min: 100, max: 400 }), flangeWidth: fc.integer({ min: 40, max: 120 }), flangeThickness: fc.integer({ min: 4, max: 15 }), webThickness: fc.integer({ min: 3, max: 12 }) }) }),
  fc.record({ shape: fc.constant("rectangularHollow"), dims: fc.record({ width: fc.integer({ min: 60, max: 300 }), depth: fc.integer({ min: 60, max: 300 }), wallThickness: fc.integer({ min: 2, max: 12 }) }) }),
);

const SHAPES: Readonly<Record<string, (dims: never) => unknown>> = { rectangle, circle, pipe, iSection, tee, channel, rectangularHollow };

function makeShape(input: unknown): unknown {
  const { shape, dims } = input as { shape: string; dims: unknown };
  const make = Object.hasOwn(SHAPES, shape) ? SHAPES[shape] : undefined;
  if (make === undefined) return undefined;
  return sectionProperties(make(dims as never) as Parameters<typeof sectionProperties>[0]);
}

const polygonParts = fc
  .record({ b: size, h: size, hole: fc.integer({ min: 1, max: 40 }) })
  .map(({ b, h, hole }) => [
    { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: b }, { y: h, z: b }, { y: h, z: 0 }] },
    { kind: "circle", centre: { y: h / 2, z: b / 2 }, radius: Math.min(hole, b / 4, h / 4), hole: true },
  ]);

describe("fuzz: section", () => {
  test.prop([corrupted(shapes)], runs)("a shape from corrupted dimensions, and its properties: finite or a typed error", (input) => {
    expectContract(input, makeShape);
  });
  test.prop([corrupted(polygonParts)], runs)("section() from corrupted parts, and its properties: finite or a typed error", (input) => {
    expectContract(input, (parts) => sectionProperties(section(parts as Parameters<typeof section>[0])));
  });
  test.prop([hostile], runs)("sectionProperties on a wholly wrong argument: a typed error", (input) => {
    expectContract(input, (i) => sectionProperties(i as Parameters<typeof sectionProperties>[0]));
  });
});

const bending = fc.record({ moment: fc.integer({ min: -1e9, max: 1e9 }), props: fc.record({ secondMomentZ: fc.integer({ min: 1, max: 1e9 }), extremes: fc.record({ top: size, bottom: size.map((v) => -v) }) }) });

describe("fuzz: stress and check", () => {
  test.prop([corrupted(bending)], runs)("extremeBendingStresses on corrupted input: finite or a typed error", (input) => {
    expectContract(input, (i) => {
      const { moment, props } = i as { moment: number; props: Parameters<typeof extremeBendingStresses>[1] };
      return extremeBendingStresses(moment, props);
    });
  });
  const checked = fc.record({
    props: fc.record({ secondMomentZ: fc.integer({ min: 1e6, max: 1e9 }), extremes: fc.record({ top: size, bottom: size.map((v) => -v) }) }),
    limits: fc.record({ bendingStress: fc.integer({ min: 1, max: 400 }), deflection: fc.record({ kind: fc.constant("ratio"), ratio: fc.constantFrom(180, 240, 360) }) }),
  });
  const solution = solveBeam({ length: 6000, stiffness: 200_000 * 1e8, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6000 }], loads: [{ kind: "distributed", from: 0, to: 6000, start: 10, end: 10 }] });
  test.prop([corrupted(checked)], runs)("checkMember with corrupted sections or limits: a verdict on finite numbers or a typed error", (input) => {
    expectContract(input, (i) => {
      const { props, limits } = i as { props: unknown; limits: unknown };
      return checkMember(solution, { properties: props } as Parameters<typeof checkMember>[1], limits as Parameters<typeof checkMember>[2]);
    });
  });
});

const quantities = fc.record({
  text: fc.constantFrom("12 kN", "3.5 m", "29000 ksi", "1.5 kip/ft", "200 GPa", "450 mm^4", "5 kN*m"),
  kind: fc.constantFrom("force", "length", "stress", "forcePerLength", "secondMoment", "moment"),
});

describe("fuzz: units", () => {
  test.prop([corrupted(quantities)], runs)("parseQuantity on corrupted text or kind: a finite quantity or a typed error", (input) => {
    expectContract(input, (i) => {
      const { text, kind } = i as { text: string; kind: Parameters<typeof parseQuantity>[1] };
      return parseQuantity(text, kind);
    });
  });
  test.prop([fc.tuple(fc.oneof(fc.double(), hostile), fc.oneof(fc.constantFrom("m", "mm", "ft", "kN", "GPa^12*GPa^12*GPa^12", "in^4", ""), hostile), fc.oneof(fc.constantFrom("m", "in", "lbf", "ksi"), hostile))], runs)(
    "convert on any value and unit texts: a finite number or a typed error",
    ([value, from, to]) => {
      expectContract([value, from, to], (i) => {
        const [v, f, t] = i as [number, string, string];
        return convert(v, f, t);
      });
    },
  );
});

afterAll(() => {
  console.log(`fuzz: ${tally.calls} calls, ${tally.typedErrors} typed errors, ${tally.results} finite results (${FUZZ_RUNS} runs per property)`);
});

describe("found by fuzzing", () => {
  test("a moment of 1e308 on a deep section: the stress M y / I is representable, so it is returned, not -Infinity", () => {
    // sigma = M y / I = 1e308 * 165 / 676276439 = 2.44e301 (the flexure formula; common practice): finite.
    const s = extremeBendingStresses(1e308, { secondMomentZ: 676276439, extremes: { top: 165, bottom: -190 } });
    expect(s.top.stress).toBeCloseTo(-(1e308 / 676276439) * 165, -290);
    expect(Number.isFinite(s.bottom.stress)).toBe(true);
  });
  test("a stress beyond double precision is refused with stress-overflow", () => {
    let code = "";
    try {
      extremeBendingStresses(1e308, { secondMomentZ: 1e-10, extremes: { top: 165, bottom: -190 } });
    } catch (e) {
      code = (e as { issues: { code: string }[] }).issues[0]?.code ?? "";
    }
    expect(code).toBe("stress-overflow");
  });
});
