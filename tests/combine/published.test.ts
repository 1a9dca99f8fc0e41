// Continuous beams of equal spans under uniform load, against the coefficients of the AISC Steel
// Construction Manual (15th ed.), Table 3-23, continuous beams (from memory: the table was not at
// hand). Two spans: both loaded, support -wL^2/8 and span 9wL^2/128; one loaded, span about
// 0.0957 wL^2 (49/512). Three spans: all loaded, supports -0.100 wL^2, end spans 0.080 wL^2,
// centre span 0.025 wL^2, reactions 0.4 wL and 1.1 wL; end spans loaded, 0.1013 wL^2 in them;
// centre span loaded, 0.075 wL^2 in it; two adjacent spans loaded, -0.1167 wL^2 at their support.
import { describe, expect, it } from "vitest";
import { evaluatePiecewise } from "../../src/math/index.js";
import { uniformLoad } from "../../src/loads/index.js";
import { combineCases, envelopes, solveCases } from "../../src/combine/index.js";

const w = 7.5;
const L = 4.2;
const member = (spans: number) => ({
  length: spans * L,
  stiffness: 31000,
  supports: Array.from({ length: spans + 1 }, (_, i) => ({ kind: i === 0 ? ("pin" as const) : ("roller" as const), at: i * L })),
  loads: [uniformLoad(0, spans * L, w, "live")],
});
const live = [{ name: "live", category: "live" as const, patterned: true }];
const wl2 = w * L * L;
const close = (actual: number, expected: number, digits = 10): void => expect(actual / wl2).toBeCloseTo(expected, digits);

describe("two equal spans, uniform load (AISC Manual Table 3-23, from memory)", () => {
  const solved = solveCases(member(2), live);
  it("combineCases with both spans loaded: support -wL^2/8, span 9wL^2/128", () => {
    const both = combineCases(solved, { live: 1 });
    close(evaluatePiecewise(both.moment, L), -1 / 8);
    close(evaluatePiecewise(both.moment, 0.375 * L), 9 / 128);
  });
  it("envelopes: the largest span moment, one span loaded, is 49/512 wL^2 (about 0.0957)", () => {
    const e = envelopes(solved, [{ name: "1.0 live", purpose: "strength", factors: { live: 1 } }]);
    close(e.moment?.upper.peak.value ?? 0, 49 / 512);
    expect(e.moment?.upper.peak.at).toBeCloseTo(0.4375 * L, 12);
    expect(e.moment?.upper.peak.name).toBe("1.0 live, live on span 1");
    close(e.moment?.lower.peak.value ?? 0, -1 / 8);
    expect(e.moment?.lower.peak.name).toBe("1.0 live, live on all spans");
  });
});

describe("three equal spans, uniform load, pattern maxima (AISC Manual Table 3-23, from memory)", () => {
  const solved = solveCases(member(3), live);
  const e = envelopes(solved, [{ name: "1.0 live", purpose: "strength", factors: { live: 1 } }]);
  it("all spans loaded: supports -0.100, end span 0.080, centre 0.025 wL^2; reactions 0.4 and 1.1 wL", () => {
    const all = combineCases(solved, { live: 1 });
    close(evaluatePiecewise(all.moment, L), -0.1);
    close(evaluatePiecewise(all.moment, 0.4 * L), 0.08);
    close(evaluatePiecewise(all.moment, 1.5 * L), 0.025);
    [0.4, 1.1, 1.1, 0.4].forEach((v, i) => expect(all.reactions[i]!.force / (w * L)).toBeCloseTo(v, 12));
  });
  it("the envelope's sagging peak is 0.1013 wL^2 in an end span, with spans 1 and 3 loaded", () => {
    close(e.moment?.upper.peak.value ?? 0, 0.10125);
    expect(e.moment?.upper.peak.name).toBe("1.0 live, live on spans 1 and 3");
  });
  it("the envelope in the centre span reaches 0.075 wL^2 with the centre span alone loaded", () => {
    close(evaluatePiecewise(e.moment!.upper.curve, 1.5 * L), 0.075);
    const piece = e.moment!.upper.curve.breaks.findIndex((b, i, all) => b <= 1.5 * L && (all[i + 1] ?? Infinity) > 1.5 * L);
    expect(e.arrangements[e.moment!.upper.governing[piece]!]?.description).toBe("live on span 2");
  });
  it("the hogging peak is -0.1167 wL^2 (7/60) at an interior support, with the two spans beside it loaded", () => {
    close(e.moment?.lower.peak.value ?? 0, -7 / 60);
    // the two interior supports tie; rounding picks one
    const at = e.moment?.lower.peak.at;
    expect([L, 2 * L]).toContain(at);
    expect(e.moment?.lower.peak.name).toBe(at === L ? "1.0 live, live on spans 1 and 2" : "1.0 live, live on spans 2 and 3");
  });
  it("the standard patterns beyond the cap find the same peaks", () => {
    const s = envelopes(solved, [{ name: "1.0 live", purpose: "strength", factors: { live: 1 } }], { pattern: { cap: 2 } });
    expect(s.arrangements.map((a) => a.description)).toEqual(["live on no span", "live on all spans", "live on spans 1 and 3", "live on span 2", "live on spans 1 and 2", "live on spans 2 and 3"]);
    close(s.moment?.upper.peak.value ?? 0, 0.10125);
    close(s.moment?.lower.peak.value ?? 0, -7 / 60);
  });
});
