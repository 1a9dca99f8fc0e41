// The flat-function style: plain numbers in, plain numbers out, one function per answer, so that a
// spreadsheet can call them cell by cell (the spreadsheet wrapper to come will build on this style).
// A function returns a number, or a string starting with "#" that says what is wrong, as a cell shows.
// Units are fixed per function and named in its name's documentation: here kN, m, mm, MPa.
// Run (after `npm run build`; the examples import the package by name, as your code will): node node_modules/.bin/unrun examples/flat-functions.ts
import { attempt, formatPath } from "flexura";
import { analyzeModel, parseModel, type ModelAnalysis } from "flexura/model";

/** A flat-function answer: a number, or "#" and a message. */
export type Cell = number | string;

function simpleSpan(spanM: number, udlKnPerM: number, pointKn: number, pointAtM: number, eMpa: number, iMm4: number): ModelAnalysis | string {
  const r = attempt(() =>
    analyzeModel(
      parseModel({
        units: { length: "m", force: "kN", deflection: "mm", stress: "MPa" },
        length: spanM,
        E: eMpa,
        I: iMm4,
        supports: [
          { at: 0, type: "pin" },
          { at: spanM, type: "roller" },
        ],
        loads: [
          { type: "distributed", from: 0, to: spanM, start: udlKnPerM },
          { type: "point", at: pointAtM, value: pointKn },
        ],
      }),
    ),
  );
  if (r.ok) return r.value;
  const i = r.error.issues[0];
  return `#${i === undefined ? "invalid input" : `${formatPath(i.path)}: ${i.message}`}`;
}

/** Peak sagging moment (kN*m) of a simple span (m) under a uniform load (kN/m) and one point load (kN at m from the left). */
export function SPAN_MAX_MOMENT(spanM: number, udlKnPerM: number, pointKn: number, pointAtM: number): Cell {
  const a = simpleSpan(spanM, udlKnPerM, pointKn, pointAtM, 200_000, 1e8);
  return typeof a === "string" ? a : a.moment.max.value;
}

/** Largest downward deflection (mm) of the same simple span, with E in MPa and I in mm^4. */
export function SPAN_MAX_DEFLECTION(spanM: number, udlKnPerM: number, pointKn: number, pointAtM: number, eMpa: number, iMm4: number): Cell {
  const a = simpleSpan(spanM, udlKnPerM, pointKn, pointAtM, eMpa, iMm4);
  return typeof a === "string" ? a : -a.deflection.min.value;
}

/** Left reaction (kN, upward) of the same simple span. */
export function SPAN_LEFT_REACTION(spanM: number, udlKnPerM: number, pointKn: number, pointAtM: number): Cell {
  const a = simpleSpan(spanM, udlKnPerM, pointKn, pointAtM, 200_000, 1e8);
  return typeof a === "string" ? a : (a.reactions[0]?.force ?? "#no reaction");
}

// As a sheet would call them, one cell at a time:
console.log("SPAN_MAX_MOMENT(6, 10, 0, 3)      =", SPAN_MAX_MOMENT(6, 10, 0, 3));
console.log("SPAN_LEFT_REACTION(6, 10, 12, 2)  =", SPAN_LEFT_REACTION(6, 10, 12, 2));
console.log("SPAN_MAX_DEFLECTION(6, 10, 0, 3, 200000, 225e6) =", SPAN_MAX_DEFLECTION(6, 10, 0, 3, 200_000, 225e6));
console.log("SPAN_MAX_MOMENT(6, 10, 5, 9)      =", SPAN_MAX_MOMENT(6, 10, 5, 9));
