import { issue, type IssuePath } from "../errors/index.js";
import type { ModelDeflectionLimit, ModelLimits, ModelLoad, ModelMaterial, ModelSegment, ModelSupport } from "./model.js";
import { arrayAt, objectAt, readQuantity, requireNotNegative, requireOnMember, requirePositive, type Reader } from "./reader.js";

type Json = Readonly<Record<string, unknown>>;

const SUPPORT_KINDS = new Set<unknown>(["pin", "roller", "fixed", "guided", "spring"]);

/** Reads the supports; those whose type or position cannot be read are left out (already reported). */
export function readSupports(reader: Reader, value: unknown, length: number | undefined): ModelSupport[] {
  const out: ModelSupport[] = [];
  arrayAt(value).forEach((raw, i) => {
    const s = objectAt(raw);
    const path = ["supports", i];
    const at = readQuantity(reader, s["at"], "length", [...path, "at"]);
    requireOnMember(reader, at, length, [...path, "at"], "support-outside-member", "support");
    const stiffness = readQuantity(reader, s["stiffness"], "translationalStiffness", [...path, "stiffness"]);
    const rotationalStiffness = readQuantity(reader, s["rotationalStiffness"], "rotationalStiffness", [...path, "rotationalStiffness"]);
    const settlement = readQuantity(reader, s["settlement"], "deflection", [...path, "settlement"]);
    const rotation = readQuantity(reader, s["rotation"], "rotation", [...path, "rotation"]);
    requireNotNegative(reader, stiffness, [...path, "stiffness"], "spring stiffness");
    requireNotNegative(reader, rotationalStiffness, [...path, "rotationalStiffness"], "rotational spring stiffness");
    if (at === undefined || !SUPPORT_KINDS.has(s["type"])) return;
    out.push({
      kind: s["type"] as ModelSupport["kind"],
      at,
      ...(stiffness === undefined ? {} : { stiffness }),
      ...(rotationalStiffness === undefined ? {} : { rotationalStiffness }),
      ...(settlement === undefined ? {} : { settlement }),
      ...(rotation === undefined ? {} : { rotation }),
    });
  });
  return out;
}

const caseOf = (l: Json): { case?: string } => (typeof l["case"] === "string" && l["case"] !== "" ? { case: l["case"] } : {});

/** Reads the loads; a JSON `"moment"` becomes a `"couple"`; distributed loads get their defaults. */
export function readLoads(reader: Reader, value: unknown, length: number | undefined): ModelLoad[] {
  const out: ModelLoad[] = [];
  arrayAt(value).forEach((raw, i) => {
    const l = objectAt(raw);
    const path = ["loads", i];
    switch (l["type"]) {
      case "point":
      case "moment": {
        const at = readQuantity(reader, l["at"], "length", [...path, "at"]);
        requireOnMember(reader, at, length, [...path, "at"], "load-outside-member", "load");
        const load = readQuantity(reader, l["value"], l["type"] === "point" ? "force" : "moment", [...path, "value"]);
        if (at !== undefined && load !== undefined) out.push({ kind: l["type"] === "point" ? "point" : "couple", at, value: load, ...caseOf(l) });
        return;
      }
      case "distributed": {
        const from = l["from"] === undefined ? 0 : readQuantity(reader, l["from"], "length", [...path, "from"]);
        const to = l["to"] === undefined ? length : readQuantity(reader, l["to"], "length", [...path, "to"]);
        requireOnMember(reader, from, length, [...path, "from"], "load-outside-member", "start of the load");
        requireOnMember(reader, to, length, [...path, "to"], "load-outside-member", "end of the load");
        if (from !== undefined && to !== undefined && !(from < to)) {
          reader.found.push(issue("load-range-empty", [...path, "to"], `The load must end after it starts; it runs from ${from} to ${to} ${reader.units.length}.`, { from, to }));
        }
        const start = readQuantity(reader, l["start"], "forcePerLength", [...path, "start"]);
        const end = l["end"] === undefined ? start : readQuantity(reader, l["end"], "forcePerLength", [...path, "end"]);
        if (from !== undefined && to !== undefined && start !== undefined && end !== undefined) {
          out.push({ kind: "distributed", from, to, start, end, ...caseOf(l) });
        }
        return;
      }
      default:
        return; // an unknown or missing type is a structural issue
    }
  });
  return out;
}

/** Reads the hinge positions, which must lie strictly inside the member. */
export function readHinges(reader: Reader, value: unknown, length: number | undefined): number[] {
  const out: number[] = [];
  arrayAt(value).forEach((raw, i) => {
    const at = readQuantity(reader, raw, "length", ["hinges", i]);
    if (at === undefined) return;
    if (length !== undefined && length > 0 && !(at > 0 && at < length)) {
      const unit = reader.units.length;
      reader.found.push(issue("hinge-outside-member", ["hinges", i], `A hinge must lie strictly inside the member (0 to ${length} ${unit}); got ${at} ${unit}.`, { at, length }));
    }
    out.push(at);
  });
  return out;
}

/** Reads the segments of a stepped member, with E defaulting to `defaultE`. */
export function readSegments(reader: Reader, value: unknown, defaultE: number | undefined): ModelSegment[] {
  const out: ModelSegment[] = [];
  arrayAt(value).forEach((raw, i) => {
    const s = objectAt(raw);
    const path = ["segments", i];
    const from = readQuantity(reader, s["from"], "length", [...path, "from"]);
    const to = readQuantity(reader, s["to"], "length", [...path, "to"]);
    const E = s["E"] === undefined ? defaultE : readQuantity(reader, s["E"], "modulus", [...path, "E"]);
    const I = readQuantity(reader, s["I"], "secondMoment", [...path, "I"]);
    if (s["E"] === undefined && defaultE === undefined) {
      reader.found.push(issue("modulus-missing", [...path, "E"], 'Give "E" for this segment, or "E" (or "material") for the whole member.'));
    }
    requirePositive(reader, s["E"] === undefined ? undefined : E, [...path, "E"], "modulus of elasticity");
    requirePositive(reader, I, [...path, "I"], "second moment of area");
    if (from !== undefined && to !== undefined && E !== undefined && I !== undefined) out.push({ from, to, E, I });
  });
  return out;
}

/** Reads the material, or undefined when it is absent or its E cannot be read. */
export function readMaterial(reader: Reader, value: unknown, path: IssuePath = ["material"]): ModelMaterial | undefined {
  if (value === undefined) return undefined;
  const m = objectAt(value);
  const E = readQuantity(reader, m["E"], "modulus", [...path, "E"]);
  requirePositive(reader, E, [...path, "E"], "modulus of elasticity");
  const yieldStrength = readQuantity(reader, m["yieldStrength"], "stress", [...path, "yieldStrength"]);
  requirePositive(reader, yieldStrength, [...path, "yieldStrength"], "yield strength");
  if (E === undefined) return undefined;
  return { ...(typeof m["name"] === "string" ? { name: m["name"] } : {}), E, ...(yieldStrength === undefined ? {} : { yieldStrength }) };
}

const RATIO = /^\s*(?:span|L)\s*\/\s*([0-9]+(?:\.[0-9]*)?(?:[eE][+-]?[0-9]+)?)\s*$/;

/** Reads a deflection limit, `"span/360"` or a length, recording problems at `path`. */
export function readDeflectionLimit(reader: Reader, value: unknown, path: IssuePath = ["limits", "deflection"]): ModelDeflectionLimit | undefined {
  if (typeof value === "string") {
    const ratio = RATIO.exec(value);
    if (ratio !== null) {
      const divisor = Number(ratio[1]);
      if (!Number.isFinite(divisor)) {
        reader.found.push(issue("not-finite", path, `The divisor of the deflection limit must be a finite number; ${JSON.stringify(value)} reads as ${divisor}.`, { value }));
        return undefined;
      }
      requirePositive(reader, divisor, path, "divisor of the deflection limit");
      return divisor > 0 && Number.isFinite(divisor) ? { kind: "ratio", ratio: divisor } : undefined;
    }
    if (!/^\s*[-+.0-9]/.test(value)) {
      reader.found.push(
        issue("deflection-limit-syntax", path, `Write the deflection limit as a fraction of the span such as "span/360", or as a length such as "20 mm"; got ${JSON.stringify(value)}.`, { value }),
      );
      return undefined;
    }
  }
  const read = readQuantity(reader, value, "deflection", path);
  requirePositive(reader, read, path, "deflection limit");
  return read !== undefined && read > 0 ? { kind: "length", value: read } : undefined;
}

/** Reads the limits block; every limit must be positive. */
export function readLimits(reader: Reader, value: unknown): ModelLimits {
  const l = objectAt(value);
  const deflection = l["deflection"] === undefined ? undefined : readDeflectionLimit(reader, l["deflection"]);
  const bendingStress = readQuantity(reader, l["bendingStress"], "stress", ["limits", "bendingStress"]);
  const shearStress = readQuantity(reader, l["shearStress"], "stress", ["limits", "shearStress"]);
  requirePositive(reader, bendingStress, ["limits", "bendingStress"], "allowable bending stress");
  requirePositive(reader, shearStress, ["limits", "shearStress"], "allowable shear stress");
  return {
    ...(deflection === undefined ? {} : { deflection }),
    ...(bendingStress === undefined ? {} : { bendingStress }),
    ...(shearStress === undefined ? {} : { shearStress }),
  };
}
