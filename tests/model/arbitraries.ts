// fast-check generators of model files: structurally valid ones (which may still fail semantic
// checks) and physically sound ones (which parse and analyse).
import { fc } from "@fast-check/vitest";
import { SHAPES } from "../../src/model/schema-section.js";

const quantity = fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }), fc.constantFrom("3 m", "12 kN", "x", "", "5 furlong"));
const maybe = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });
const unitName = fc.constantFrom("m", "mm", "kN", "kip", "MPa", "ksi", "in^4", "kN/m", "");

/** Drops keys whose value is undefined, so the object is what JSON would hold. */
function clean<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

const support = fc
  .record({
    at: quantity,
    type: fc.constantFrom("pin", "roller", "fixed", "guided", "spring"),
    stiffness: maybe(quantity),
    rotationalStiffness: maybe(quantity),
    settlement: maybe(quantity),
    rotation: maybe(quantity),
  })
  .map((s) => {
    const out: Record<string, unknown> = { ...s };
    if (s.type === "spring") {
      if (s.stiffness === undefined && s.rotationalStiffness === undefined) out["stiffness"] = 1000;
    } else {
      delete out["stiffness"];
      delete out["rotationalStiffness"];
    }
    if (s.type === "pin" || s.type === "roller" || s.type === "spring") delete out["rotation"];
    return clean(out);
  });

const load = fc.oneof(
  fc.record({ type: fc.constantFrom("point", "moment"), at: quantity, value: quantity, case: maybe(fc.constantFrom("dead", "live")) }).map(clean),
  fc.record({ type: fc.constant("distributed"), from: maybe(quantity), to: maybe(quantity), start: quantity, end: maybe(quantity) }).map(clean),
);

const shapeSection = fc.constantFrom(...SHAPES).chain((spec) =>
  fc
    .tuple(fc.tuple(...spec.required.map(() => quantity)), fc.tuple(...spec.optional.map(() => maybe(quantity))))
    .map(([values, optional]) =>
      clean({
        shape: spec.shape,
        ...Object.fromEntries(spec.required.map((d, i) => [d.name, values[i]])),
        ...Object.fromEntries(spec.optional.map((d, i) => [d.name, optional[i]])),
      }),
    ),
);

const plate = fc.record({ width: quantity, thickness: quantity });
const plateGirder = fc
  .record({ shape: fc.constant("plate-girder"), topFlange: plate, web: fc.record({ depth: quantity, thickness: quantity }), bottomFlange: maybe(plate) })
  .map(clean);

const point = fc.record({ y: quantity, z: quantity });
const partExtras = fc
  .record({ hole: maybe(fc.boolean()), material: maybe(fc.record({ E: quantity, name: maybe(fc.string()) }).map(clean)), modularRatio: maybe(fc.double({ noNaN: true, noDefaultInfinity: true })) })
  .map((x) => clean(x.material === undefined ? x : { ...x, modularRatio: undefined }));
const part = fc
  .tuple(
    fc.oneof(
      fc.record({ type: fc.constant("polygon"), points: fc.array(point, { minLength: 3, maxLength: 5 }) }),
      fc.record({ type: fc.constant("circle"), centre: point, radius: quantity }),
      fc.record({ type: fc.constant("sector"), centre: point, radius: quantity, startAngle: quantity, sweep: quantity }),
      fc.record({ type: fc.constant("fillet"), corner: point, radius: quantity, orientation: quantity }),
    ),
    partExtras,
  )
  .map(([p, extras]) => ({ ...p, ...extras }));
const builtUp = fc.record({ shape: fc.constant("built-up"), parts: fc.array(part, { minLength: 1, maxLength: 3 }) });

const section = fc.oneof(shapeSection, plateGirder, builtUp);

/** Model files that satisfy the schema (structure), whatever their numbers mean. */
export const structurallyValidModel = fc
  .record({
    format: maybe(fc.constant(1)),
    name: maybe(fc.string()),
    units: maybe(fc.record({ length: maybe(unitName.filter((u) => u !== "")), force: maybe(unitName.filter((u) => u !== "")), system: maybe(fc.constantFrom("usKipFoot", "siNewtonMetre")) }).map(clean)),
    length: quantity,
    E: maybe(quantity),
    I: maybe(quantity),
    segments: maybe(fc.array(fc.record({ from: quantity, to: quantity, E: maybe(quantity), I: quantity }).map(clean), { minLength: 1, maxLength: 3 })),
    section: maybe(section),
    material: maybe(fc.record({ E: quantity, name: maybe(fc.string()), yieldStrength: maybe(quantity) }).map(clean)),
    supports: fc.array(support, { minLength: 1, maxLength: 4 }),
    hinges: maybe(fc.array(quantity, { maxLength: 2 })),
    loads: maybe(fc.array(load, { maxLength: 4 })),
    limits: maybe(fc.record({ deflection: maybe(fc.oneof(fc.constant("span/360"), quantity)), bendingStress: maybe(quantity), shearStress: maybe(quantity) }).map(clean)),
  })
  .map(clean);

type Json = Record<string, unknown>;

/** One structural change that may or may not break a valid model. */
const mutation = fc.oneof(
  fc.record({ op: fc.constant("delete" as const), key: fc.constantFrom("length", "supports", "at", "type", "value", "start", "shape", "E", "I", "stiffness", "parts", "points", "radius", "web", "y") }),
  fc.record({ op: fc.constant("set" as const), key: fc.constantFrom("length", "supports", "loads", "at", "type", "value", "units", "format", "case", "lenght", "stiffness", "rotation", "depth", "hinges", "limits", "parts", "hole", "modularRatio", "material", "topFlange", "z", "sweep"), value: fc.jsonValue({ maxDepth: 2 }) }),
);

function mutate(value: unknown, m: { op: "delete" | "set"; key: string; value?: unknown }, pick: number): unknown {
  // Apply to the root or to one nested object chosen by `pick`.
  const objects: Json[] = [];
  const visit = (v: unknown): void => {
    if (Array.isArray(v)) v.forEach(visit);
    else if (typeof v === "object" && v !== null) {
      objects.push(v as Json);
      Object.values(v).forEach(visit);
    }
  };
  const copy = structuredClone(value);
  visit(copy);
  const target = objects[pick % Math.max(1, objects.length)];
  if (target !== undefined) {
    if (m.op === "delete") delete target[m.key];
    else target[m.key] = m.value;
  }
  return copy;
}

/** Model files, most of them broken in one or more places, some still valid. */
export const possiblyInvalidModel = fc.oneof(
  fc.tuple(structurallyValidModel, fc.array(fc.tuple(mutation, fc.nat()), { minLength: 1, maxLength: 3 })).map(([model, ms]) =>
    ms.reduce<unknown>((acc, [m, pick]) => mutate(acc, m, pick), model),
  ),
  fc.jsonValue({ maxDepth: 3 }),
);
