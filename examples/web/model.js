// Turns the form's fields into a flexura model (the model-file format, docs/model-format.md). Kept apart from
// the page so that the browser test builds exactly the same model in Node and compares the numbers.

/** The form's fields, as the page reads them: text as typed, units fixed per field. */
export const FIELDS = [
  { name: "span", label: "Span", unit: "m", value: "5.4" },
  { name: "udl", label: "Uniform load", unit: "kN/m", value: "14" },
  { name: "point", label: "Point load", unit: "kN", value: "9" },
  { name: "pointAt", label: "Point load at", unit: "m", value: "2.2" },
  { name: "depth", label: "Depth", unit: "mm", value: "350" },
  { name: "flangeWidth", label: "Flange width", unit: "mm", value: "170" },
  { name: "flangeThickness", label: "Flange thickness", unit: "mm", value: "14" },
  { name: "webThickness", label: "Web thickness", unit: "mm", value: "8" },
  { name: "E", label: "Young's modulus", unit: "GPa", value: "200" },
  { name: "bendingStress", label: "Allowable bending stress", unit: "MPa", value: "165" },
  { name: "deflectionRatio", label: "Deflection limit, span /", unit: "", value: "360" },
];

/** A number as typed, or the text itself so that the model reader names the field that is wrong. */
function read(text) {
  const trimmed = String(text).trim();
  return trimmed !== "" && Number.isFinite(Number(trimmed)) ? Number(trimmed) : trimmed;
}

/** The model of a simply supported I-section member for the form's values (a record of field name to text). */
export function memberModel(values) {
  const v = (name) => read(values[name]);
  const span = v("span");
  return {
    name: "Member from the form",
    units: { length: "m", force: "kN", deflection: "mm", stress: "MPa" },
    length: span,
    E: typeof v("E") === "number" ? `${v("E")} GPa` : v("E"),
    supports: [{ at: 0, type: "pin" }, { at: span, type: "roller" }],
    loads: [
      { type: "distributed", start: v("udl"), case: "total" },
      { type: "point", at: v("pointAt"), value: v("point"), case: "total" },
    ],
    section: {
      shape: "i-section",
      depth: v("depth"),
      flangeWidth: v("flangeWidth"),
      flangeThickness: v("flangeThickness"),
      webThickness: v("webThickness"),
    },
    limits: { deflection: `span/${String(values.deflectionRatio).trim()}`, bendingStress: v("bendingStress") },
  };
}
