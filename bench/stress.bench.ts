import { bench, suite } from "./harness.js";
import { iSection } from "../src/section/index.js";
import { biaxialBendingStress, cornerStresses, extremeBendingStresses, peakShearStress, sectionPeakShearStress, shearStressAt, type DepthBand } from "../src/stress/index.js";

// An invented welded I section 180 x 12 flanges, 8 mm web, 360 mm deep, as depth bands about its centroid.
const weldedI: DepthBand[] = [
  { kind: "trapezoid", yBottom: -180, yTop: -168, widthBottom: 180, widthTop: 180 },
  { kind: "trapezoid", yBottom: -168, yTop: 168, widthBottom: 8, widthTop: 8 },
  { kind: "trapezoid", yBottom: 168, yTop: 180, widthBottom: 180, widthTop: 180 },
];
const inertia = (180 * 360 ** 3 - 172 * 336 ** 3) / 12;
const angle = { secondMomentZ: 3.4e6, secondMomentY: 1.2e6, productMoment: -1.1e6 };
const corners = [
  { y: -48, z: -23 },
  { y: -48, z: 77 },
  { y: -38, z: 77 },
  { y: -38, z: -13 },
  { y: 102, z: -13 },
  { y: 102, z: -23 },
];

suite("stress", () => {
  bench("stress: extremeBendingStresses (one moment)", () => extremeBendingStresses(8e7, { secondMomentZ: inertia, extremes: { top: 180, bottom: -180 } }));
  bench("stress: biaxialBendingStress (one point)", () => biaxialBendingStress({ momentZ: 8e6, momentY: 1e6 }, { y: 102, z: -23 }, angle));
  bench("stress: cornerStresses (angle, 6 corners)", () => cornerStresses({ momentZ: 8e6, momentY: 0 }, angle, corners));
  bench("stress: shearStressAt (I section, one cut)", () => shearStressAt(1.5e5, 0, weldedI, { secondMomentZ: inertia }));
  bench("stress: peakShearStress (I section)", () => peakShearStress(1.5e5, weldedI, { secondMomentZ: inertia }));
});

const rolled = iSection({ depth: 360, flangeWidth: 180, flangeThickness: 12, webThickness: 8, rootRadius: 10 });
suite("stress on sections", () => {
  bench("stress: sectionPeakShearStress (I section with root fillets)", () => sectionPeakShearStress(1.5e5, rolled));
});
