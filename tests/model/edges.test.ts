import { describe, expect, it } from "vitest";
import { formatPath, isFlexuraError } from "../../src/errors/index.js";
import { refuseNotFinite } from "../../src/model/not-finite.js";
import { analyzeModel, DEFAULT_MODEL_UNITS, MODEL_LIST_LIMIT, modelSchema, parseModel, tryAnalyzeModel, tryParseModel } from "../../src/model/index.js";

// An invented simple span: 6 m, E = 200 GPa, I = 8.5e7 mm^4, 10 kN at midspan.
const base = (): Record<string, unknown> => ({
  length: 6,
  E: "200 GPa",
  I: "8.5e7 mm^4",
  supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }],
  loads: [{ type: "point", at: 3, value: 10 }],
});

function problems(json: unknown): string[] {
  const r = tryParseModel(json);
  return r.ok ? [] : r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`);
}

describe("keys named after Object.prototype members", () => {
  it("__proto__, constructor and prototype are unknown fields like any other unknown key, at every depth", () => {
    const text = JSON.stringify(base()).replace(/^\{/, '{"__proto__":{"x":1},"constructor":1,"prototype":2,');
    const json = JSON.parse(text.replace('{"at":0,"type":"pin"}', '{"at":0,"type":"pin","__proto__":{},"constructor":"x"}')) as unknown;
    expect(problems(json).sort()).toEqual([
      "__proto__ [unknown-field]",
      "constructor [unknown-field]",
      "prototype [unknown-field]",
      "supports[0].__proto__ [unknown-field]",
      "supports[0].constructor [unknown-field]",
    ]);
  });

  it("the same keys inside units, loads, limits and sections are unknown fields", () => {
    const json = JSON.parse(
      JSON.stringify({
        ...base(),
        units: { toString: "m" },
        loads: [{ type: "point", at: 3, value: 10, hasOwnProperty: 1 }],
        limits: { valueOf: 1 },
        section: { shape: "rectangle", width: 100, depth: 200, constructor: 1 },
        I: undefined,
      }),
    ) as unknown;
    expect(problems(json).sort()).toEqual(["limits.valueOf [unknown-field]", "loads[0].hasOwnProperty [unknown-field]", "section.constructor [unknown-field]", "units.toString [unknown-field]"]);
  });

  it("a required field is not found on the prototype", () => {
    const inherited = Object.create({ length: 6 }) as Record<string, unknown>;
    Object.assign(inherited, { E: "200 GPa", I: "8.5e7 mm^4", supports: [{ at: 0, type: "fixed" }] });
    expect(problems(inherited)).toEqual(["length [missing-field]"]);
  });

  it("a load case named constructor (or __proto__) is a label like any other, with factor 1", () => {
    for (const name of ["constructor", "__proto__", "hasOwnProperty", "toString"]) {
      const a = analyzeModel(parseModel({ ...base(), loads: [{ type: "point", at: 3, value: 10, case: name }] }));
      // Simple span, central point load: each reaction P / 2 (common practice).
      expect(a.reactions.map((r) => r.force)).toEqual([5, 5].map((v) => expect.closeTo(v, 12) as unknown as number));
      expect(a.model.loads[0]?.case).toBe(name);
    }
  });
});

describe("units", () => {
  it("a unit-system name that is an Object.prototype member is not an option (typed, not a TypeError)", () => {
    for (const system of ["hasOwnProperty", "constructor", "__proto__", "toString"]) {
      expect(problems({ ...base(), units: { system } })).toEqual(["units.system [not-an-option]"]);
    }
  });

  it("blank unit strings (a tab, two spaces) are refused, not replaced by the default", () => {
    expect(problems({ ...base(), units: { length: "\t", force: "  " } })).toEqual(["units.length [empty-string]", "units.force [empty-string]"]);
    expect(problems({ ...base(), units: { stress: "" } })).toEqual(["units.stress [empty-string]"]);
  });

  it("the published schema says the same: unit fields must hold a non-blank character", () => {
    const units = (modelSchema["$defs"] as Record<string, { properties: Record<string, { pattern?: string }> }>)["units"];
    expect(units?.properties["length"]?.pattern).toBe("\\S");
  });
});

describe("limits", () => {
  it("a deflection limit of span/1e999 (an infinite divisor) is refused, not dropped", () => {
    expect(problems({ ...base(), limits: { deflection: "span/1e999" } })).toEqual(["limits.deflection [not-finite]"]);
    expect(problems({ ...base(), limits: { deflection: "L/0" } })).toEqual(["limits.deflection [value-not-positive]"]);
  });
});

describe("exported constants cannot be changed", () => {
  it("modelSchema is frozen all the way down, and parseModel is unaffected by attempts to change it", () => {
    const defs = modelSchema["$defs"] as Record<string, { properties: { type: { enum: string[] } } }>;
    expect(Object.isFrozen(modelSchema)).toBe(true);
    expect(() => {
      (modelSchema as Record<string, unknown>)["title"] = "x";
    }).toThrowError(TypeError);
    expect(() => defs["support"]?.properties.type.enum.push("hovering")).toThrowError(TypeError);
    expect(problems({ ...base(), supports: [{ at: 0, type: "hovering" }] })).toEqual(["supports[0].type [not-an-option]"]);
  });

  it("DEFAULT_MODEL_UNITS is frozen, and models still read in metres by default", () => {
    expect(Object.isFrozen(DEFAULT_MODEL_UNITS)).toBe(true);
    expect(() => {
      (DEFAULT_MODEL_UNITS as { length: string }).length = "ft";
    }).toThrowError(TypeError);
    expect(parseModel(base()).units.length).toBe("m");
  });
});

describe("results that are not finite are refused", () => {
  it("a settlement alone gives no imbalance warning and finite results", () => {
    const a = analyzeModel(parseModel({ ...base(), loads: [], supports: [{ at: 0, type: "pin" }, { at: 3, type: "roller", settlement: 5 }, { at: 6, type: "roller" }] }));
    expect(a.warnings).toEqual([]);
    expect(Number.isFinite(a.deflection.min.value)).toBe(true);
    // Two equal spans, middle support settling delta: R_middle = -48 E I delta / L^3 (L = 6 m total; common practice).
    const EI = 200e6 * 8.5e-5; // kN*m^2
    expect(a.reactions[1]?.force).toBeCloseTo((-48 * EI * 0.005) / 6 ** 3, 9);
  });

  it("a tiny but positive I giving infinite deflections is refused with result-not-finite", () => {
    const r = tryAnalyzeModel(parseModel({ ...base(), I: 1e-300 }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`)).toContain("I [result-not-finite]");
  });

  it("a tiny but positive allowable stress giving an infinite utilisation is refused with result-not-finite", () => {
    const r = tryAnalyzeModel(parseModel({ ...base(), I: undefined, section: { shape: "rectangle", width: 100, depth: 200 }, limits: { bendingStress: 1e-320 } }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`)).toEqual(["limits.bendingStress [result-not-finite]"]);
  });
});

describe("a model built in code meets typed errors, never JavaScript's conversions", () => {
  const model = parseModel(base());
  const codesOf = (m: unknown): string[] => {
    const r = tryAnalyzeModel(m as never);
    return r.ok ? [] : r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`);
  };

  it("an array nested 20,000 deep where a number is due is wrong-type, not a RangeError", () => {
    let deep: unknown = 6;
    for (let i = 0; i < 20000; i++) deep = [deep];
    expect(codesOf({ ...model, length: deep })).toEqual(["length [wrong-type]"]);
    expect(codesOf({ ...model, hinges: [deep] })).toEqual(["hinges[0] [wrong-type]"]);
  });

  it("numbers written as strings or one-item lists are refused, not converted", () => {
    expect(codesOf({ ...model, length: "6" })).toEqual(["length [wrong-type]"]);
    expect(codesOf({ ...model, length: [6] })).toEqual(["length [wrong-type]"]);
    expect(codesOf({ ...model, loads: [{ kind: "point", at: 3, value: [10] }] })).toEqual(["loads[0].value [wrong-type]"]);
    expect(codesOf({ ...model, limits: { deflection: { kind: "ratio", ratio: [360] } } })).toEqual(["limits.deflection.ratio [wrong-type]"]);
  });

  it("missing or null containers are typed errors", () => {
    expect(codesOf(null)).toEqual(["(input) [wrong-type]"]);
    expect(codesOf({ ...model, units: null })).toEqual(["units [wrong-type]"]);
    expect(codesOf({ ...model, loads: null })).toEqual(["loads [wrong-type]"]);
    expect(codesOf({ ...model, loads: [null] })).toEqual(["loads[0] [wrong-type]"]);
    expect(codesOf({ ...model, limits: null })).toEqual(["limits [wrong-type]"]);
    expect(codesOf({ ...model, supports: [{}] })).toEqual(["supports[0].kind [not-an-option]", "supports[0].at [wrong-type]"]);
    expect(codesOf({ ...model, section: { shape: "built-up", parts: [{ kind: "polygon", hole: false, points: [null] }] }, I: undefined })).toEqual(["section.parts[0].points[0] [wrong-type]"]);
    expect(codesOf({ ...model, E: Number.NaN })).toEqual(["E [not-finite]"]);
  });

  it("fields inherited from a prototype are not read", () => {
    const inherited = Object.assign(Object.create({ length: 6 }) as object, { ...model, length: undefined });
    expect(codesOf(inherited)).toEqual(["length [wrong-type]"]);
  });

  it("a sound model built in code analyses as the parsed one does", () => {
    expect(analyzeModel({ ...model }).reactions).toEqual(analyzeModel(model).reactions);
  });
});

describe("bounded work: a size limit on every list", () => {
  it("a list longer than MODEL_LIST_LIMIT is refused with too-many-items before any item is read", () => {
    const loads = Array.from({ length: MODEL_LIST_LIMIT + 1 }, () => ({ type: "point", at: 3, value: "not a force" }));
    expect(problems({ ...base(), loads })).toEqual(["loads [too-many-items]"]);
    expect(problems({ ...base(), hinges: new Array<number>(MODEL_LIST_LIMIT + 1).fill(3) })).toEqual(["hinges [too-many-items]"]);
    const model = parseModel(base());
    const r = tryAnalyzeModel({ ...model, loads: new Array(MODEL_LIST_LIMIT + 1).fill(model.loads[0]) });
    expect(r.ok || r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`)).toEqual(["loads [too-many-items]"]);
  });

  it("the published schema carries the same limit", () => {
    const properties = modelSchema["properties"] as Record<string, { maxItems?: number }>;
    expect(properties["loads"]?.maxItems).toBe(MODEL_LIST_LIMIT);
    expect(properties["supports"]?.maxItems).toBe(MODEL_LIST_LIMIT);
  });

  it("5,000 point loads (within the limit) analyse, with every load kept", () => {
    const loads = Array.from({ length: 5000 }, (_, i) => ({ type: "point", at: (6 * (i + 0.5)) / 5000, value: 0.002 }));
    const a = analyzeModel(parseModel({ ...base(), loads }));
    // Total load 10 kN, symmetric: each reaction 5 kN (statics).
    expect(a.reactions[0]?.force).toBeCloseTo(5, 9);
    expect(a.reactions[1]?.force).toBeCloseTo(5, 9);
  });
});

describe("refuseNotFinite names the input behind a result that is not finite", () => {
  const model = parseModel(base());
  const at = (where: (string | number)[], m = model): string => {
    try {
      refuseNotFinite(m, where, Number.POSITIVE_INFINITY);
    } catch (e) {
      return isFlexuraError(e) ? `${formatPath(e.issues[0]?.path ?? [])} [${e.code}]` : "raw";
    }
    return "returned";
  };
  it("deflections and slopes point at the stiffness; stresses at the section; reactions and moments at the loads; checks at the limits", () => {
    expect(at(["deflection", "min", "value"])).toBe("I [result-not-finite]");
    expect(at(["diagrams", "slope", "pieces", 0])).toBe("I [result-not-finite]");
    const { I: _I, ...withoutI } = model;
    expect(at(["deflection"], withoutI)).toBe("section [result-not-finite]");
    expect(at(["deflection"], { ...model, segments: [] })).toBe("segments [result-not-finite]");
    expect(at(["stress", "tension", "value"])).toBe("section [result-not-finite]");
    expect(at(["section", "area"])).toBe("section [result-not-finite]");
    expect(at(["reactions", 0, "force"])).toBe("loads [result-not-finite]");
    expect(at(["diagrams", "moment"])).toBe("loads [result-not-finite]");
    expect(at(["checks", 0, "utilisation"])).toBe("limits [result-not-finite]");
    expect(at(["constructor"])).toBe("loads [result-not-finite]");
  });
});

describe("a cloned analysis carries only its own data", () => {
  it("structuredClone of a small analysis holds no buffer larger than the diagram it belongs to", () => {
    const a = analyzeModel(parseModel(base()));
    const copy = structuredClone(a);
    const sizes: number[] = [];
    const visit = (v: unknown): void => {
      if (ArrayBuffer.isView(v)) sizes.push(v.buffer.byteLength);
      else if (Array.isArray(v)) v.forEach(visit);
      else if (typeof v === "object" && v !== null) Object.values(v).forEach(visit);
    };
    visit(copy);
    expect(sizes.length).toBeGreaterThan(0);
    // Two pieces of a cubic at most: breaks and coefficients are a few dozen doubles, far below a shared 16 KiB block.
    for (const bytes of sizes) expect(bytes).toBeLessThanOrEqual(256);
    expect(copy.reactions).toEqual(a.reactions);
  });
});

describe("a part's allowable that overflows the utilisation is reported at the part", () => {
  it("a built-up part with a tiny bendingStress of its own: result-not-finite at section.parts[1].bendingStress", () => {
    // An invented timber-and-steel flitch: two timber plies, a steel plate with its own (absurd) allowable.
    const box = (z0: number, z1: number) => ({ type: "polygon", points: [{ y: 0, z: z0 }, { y: 0, z: z1 }, { y: 240, z: z1 }, { y: 240, z: z0 }] });
    const file = {
      length: 4.8,
      material: { name: "timber", E: "11 GPa" },
      section: { shape: "built-up", parts: [box(0, 45), { ...box(45, 55), material: { name: "steel", E: "200 GPa" }, bendingStress: 1e-320 }, box(55, 100)] },
      supports: [{ at: 0, type: "pin" }, { at: 4.8, type: "roller" }],
      loads: [{ type: "distributed", start: 2.2 }],
      limits: { bendingStress: "12 MPa" },
    };
    const r = tryAnalyzeModel(parseModel(file));
    expect(r.ok || r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`)).toEqual(["section.parts[1].bendingStress [result-not-finite]"]);
  });
});
