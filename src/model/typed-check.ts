// The typed check of a Model built in code (not read by parseModel): every field analyzeModel reads
// must be of its type, read as an own property, before any arithmetic. Without it, `length: [6]`
// was multiplied as 6, `"6"` as 6, and an array nested 20,000 deep overflowed the stack while
// JavaScript turned it into a number. The check never descends into a value it does not expect,
// so it is bounded by the depth of the Model type itself (at most 6 levels).
import { describeValue, FlexuraError, issue, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { SECTION_PART_TYPES } from "./schema-built.js";
import { MODEL_LIST_LIMIT, SUPPORT_TYPES } from "./schema-parts.js";
import { SECTION_SHAPES } from "./schema-section.js";
import { MODEL_UNIT_FIELDS } from "./units.js";

type Json = Readonly<Record<string, unknown>>;

class TypedCheck {
  readonly found: FlexuraIssue[] = [];

  wrong(path: IssuePath, what: string, value: unknown): void {
    this.found.push(issue("wrong-type", path, `Expected ${what}; got ${describeValue(value)}.`, { value: describeValue(value) }));
  }

  /** The object at `value` (reported when it is not one). */
  object(value: unknown, path: IssuePath, what = "an object"): Json | undefined {
    if (typeof value === "object" && value !== null && !Array.isArray(value)) return value as Json;
    this.wrong(path, what, value);
    return undefined;
  }

  /** The array at `value` (reported when it is not one). */
  list(value: unknown, path: IssuePath): readonly unknown[] | undefined {
    if (Array.isArray(value) && value.length > MODEL_LIST_LIMIT) {
      this.found.push(issue("too-many-items", path, `This list holds ${value.length} items; a model may hold at most ${MODEL_LIST_LIMIT} in one list.`, { maxItems: MODEL_LIST_LIMIT, count: value.length }));
      return undefined;
    }
    if (Array.isArray(value)) return value as readonly unknown[];
    this.wrong(path, "a list", value);
    return undefined;
  }

  /** A finite number at `value`; `optional` allows undefined. */
  number(value: unknown, path: IssuePath, optional = false): void {
    if (value === undefined && optional) return;
    if (typeof value !== "number") this.wrong(path, "a number", value);
    else if (!Number.isFinite(value)) this.found.push(issue("not-finite", path, `Expected a finite number; got ${String(value)}.`, { value: String(value) }));
  }

  string(value: unknown, path: IssuePath, optional = false): void {
    if (value === undefined && optional) return;
    if (typeof value !== "string") this.wrong(path, "a string", value);
  }

  option(value: unknown, options: readonly string[], path: IssuePath): boolean {
    if (typeof value === "string" && options.includes(value)) return true;
    this.found.push(issue("not-an-option", path, `Expected one of ${options.map((o) => JSON.stringify(o)).join(", ")}; got ${describeValue(value)}.`, { value: describeValue(value) }));
    return false;
  }

  /** Each of `names` of `o` as a number (own properties only). */
  numbers(o: Json, names: readonly string[], path: IssuePath, optional = false): void {
    for (const name of names) this.number(own(o, name), [...path, name], optional);
  }
}

/** The value of an own property, never one inherited from a prototype. */
const own = (o: Json, name: string): unknown => (Object.hasOwn(o, name) ? o[name] : undefined);

function checkMaterial(c: TypedCheck, value: unknown, path: IssuePath): void {
  const m = c.object(value, path, "a material { E, name?, yieldStrength? }");
  if (m === undefined) return;
  c.number(own(m, "E"), [...path, "E"]);
  c.number(own(m, "yieldStrength"), [...path, "yieldStrength"], true);
  c.string(own(m, "name"), [...path, "name"], true);
}

function checkPoint(c: TypedCheck, value: unknown, path: IssuePath): void {
  const p = c.object(value, path, "a point { y, z }");
  if (p !== undefined) c.numbers(p, ["y", "z"], path);
}

const PART_FIELDS: Readonly<Record<(typeof SECTION_PART_TYPES)[number], readonly string[]>> = {
  polygon: [],
  circle: ["radius"],
  sector: ["radius", "startAngle", "sweep"],
  fillet: ["radius", "orientation"],
};

function checkPart(c: TypedCheck, value: unknown, path: IssuePath): void {
  const p = c.object(value, path, "a section part");
  if (p === undefined) return;
  if (typeof own(p, "hole") !== "boolean") c.wrong([...path, "hole"], "true or false", own(p, "hole"));
  if (own(p, "material") !== undefined) checkMaterial(c, own(p, "material"), [...path, "material"]);
  c.numbers(p, ["modularRatio", "bendingStress", "shearStress"], path, true);
  const kind = own(p, "kind");
  if (!c.option(kind, SECTION_PART_TYPES, [...path, "kind"])) return;
  const k = kind as (typeof SECTION_PART_TYPES)[number];
  c.numbers(p, PART_FIELDS[k], path);
  if (k === "polygon") c.list(own(p, "points"), [...path, "points"])?.forEach((q, i) => checkPoint(c, q, [...path, "points", i]));
  else checkPoint(c, own(p, k === "fillet" ? "corner" : "centre"), [...path, k === "fillet" ? "corner" : "centre"]);
}

function checkSection(c: TypedCheck, value: unknown): void {
  const s = c.object(value, ["section"], "a section");
  if (s === undefined) return;
  const shape = own(s, "shape");
  if (!c.option(shape, SECTION_SHAPES, ["section", "shape"])) return;
  if (shape === "built-up") {
    c.list(own(s, "parts"), ["section", "parts"])?.forEach((p, i) => checkPart(c, p, ["section", "parts", i]));
  } else if (shape === "plate-girder") {
    for (const [name, fields, optional] of [["topFlange", ["width", "thickness"], false], ["web", ["depth", "thickness"], false], ["bottomFlange", ["width", "thickness"], true]] as const) {
      if (optional && own(s, name) === undefined) continue;
      const plate = c.object(own(s, name), ["section", name], "a plate");
      if (plate !== undefined) c.numbers(plate, fields, ["section", name]);
    }
  } else {
    const d = c.object(own(s, "dimensions"), ["section", "dimensions"], "the dimensions { name: number }");
    if (d !== undefined) c.numbers(d, Object.keys(d), ["section", "dimensions"]);
  }
}

function checkSupport(c: TypedCheck, value: unknown, path: IssuePath): void {
  const s = c.object(value, path, "a support");
  if (s === undefined) return;
  c.option(own(s, "kind"), SUPPORT_TYPES, [...path, "kind"]);
  c.number(own(s, "at"), [...path, "at"]);
  c.numbers(s, ["stiffness", "rotationalStiffness", "settlement", "rotation"], path, true);
}

function checkLoad(c: TypedCheck, value: unknown, path: IssuePath): void {
  const l = c.object(value, path, "a load");
  if (l === undefined) return;
  c.string(own(l, "case"), [...path, "case"], true);
  const kind = own(l, "kind");
  if (!c.option(kind, ["point", "couple", "distributed"], [...path, "kind"])) return;
  c.numbers(l, kind === "distributed" ? ["from", "to", "start", "end"] : ["at", "value"], path);
}

function checkLimits(c: TypedCheck, value: unknown): void {
  const l = c.object(value, ["limits"], "the limits { deflection?, bendingStress?, shearStress? }");
  if (l === undefined) return;
  c.numbers(l, ["bendingStress", "shearStress"], ["limits"], true);
  const deflection = own(l, "deflection");
  if (deflection === undefined) return;
  const d = c.object(deflection, ["limits", "deflection"], 'a deflection limit { kind: "ratio", ratio } or { kind: "length", value }');
  if (d === undefined || !c.option(own(d, "kind"), ["ratio", "length"], ["limits", "deflection", "kind"])) return;
  c.number(own(d, own(d, "kind") === "ratio" ? "ratio" : "value"), ["limits", "deflection", own(d, "kind") === "ratio" ? "ratio" : "value"]);
}

/**
 * Checks that a {@link Model} has every field analyzeModel reads, of its type (own properties
 * only; numbers finite), so that a model built in code meets the same typed errors as one read by
 * parseModel rather than JavaScript's conversions. Meaning (positions, positive sizes, units that
 * read) is checked later by the solver, the section builders, the checks and the unit reader.
 *
 * @throws FlexuraError `wrong-type`, `not-finite`, `not-an-option`, `too-many-items` with paths into the model.
 */
export function checkTypedModel(model: unknown): void {
  const c = new TypedCheck();
  const m = c.object(model, [], "a model (from parseModel)");
  if (m === undefined) throw new FlexuraError(c.found);
  c.string(own(m, "name"), ["name"], true);
  c.string(own(m, "description"), ["description"], true);
  const units = c.object(own(m, "units"), ["units"], "the units { length, force, ... }");
  if (units !== undefined) for (const field of MODEL_UNIT_FIELDS) c.string(own(units, field), ["units", field]);
  c.number(own(m, "length"), ["length"]);
  c.numbers(m, ["E", "I"], [], true);
  if (own(m, "segments") !== undefined) {
    c.list(own(m, "segments"), ["segments"])?.forEach((s, i) => {
      const seg = c.object(s, ["segments", i], "a segment { from, to, E, I }");
      if (seg !== undefined) c.numbers(seg, ["from", "to", "E", "I"], ["segments", i]);
    });
  }
  if (own(m, "material") !== undefined) checkMaterial(c, own(m, "material"), ["material"]);
  if (own(m, "section") !== undefined) checkSection(c, own(m, "section"));
  c.list(own(m, "supports"), ["supports"])?.forEach((s, i) => checkSupport(c, s, ["supports", i]));
  c.list(own(m, "hinges"), ["hinges"])?.forEach((h, i) => c.number(h, ["hinges", i]));
  c.list(own(m, "loads"), ["loads"])?.forEach((l, i) => checkLoad(c, l, ["loads", i]));
  checkLimits(c, own(m, "limits"));
  if (c.found.length > 0) throw new FlexuraError(c.found);
}
