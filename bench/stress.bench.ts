import { bench, suite } from "./harness.js";
import { circle, iSection, pipe, section } from "../src/section/index.js";
import { biaxialBendingStress, cornerStresses, extremeBendingStresses, peakShearStress, sectionPeakShearStress, shearStressAt, type DepthBand } from "../src/stress/index.js";

// A square 50 mm a side standing on a corner, as two triangles about its centroid.
const diamond: DepthBand[] = [
  { kind: "trapezoid", yBottom: -50, yTop: 0, widthBottom: 0, widthTop: 100 },
  { kind: "trapezoid", yBottom: 0, yTop: 50, widthBottom: 100, widthTop: 0 },
];
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
  bench("stress: peakShearStress (diamond, peak off the neutral axis)", () => peakShearStress(2e4, diamond, { secondMomentZ: 2 * 50 ** 4 / 12 }));
});

const bar = circle({ diameter: 60 });
const tube = pipe({ outsideDiameter: 168.3, wallThickness: 7.1 });
const halfDisc = section([
  { kind: "polygon", points: [{ y: -40, z: -50 }, { y: -40, z: 50 }, { y: 0, z: 50 }, { y: 0, z: -50 }] },
  { kind: "sector", centre: { y: 0, z: 0 }, radius: 50, startAngle: 0, sweep: Math.PI },
]);
const rolled = iSection({ depth: 360, flangeWidth: 180, flangeThickness: 12, webThickness: 8, rootRadius: 10 });
suite("stress on sections", () => {
  bench("stress: sectionPeakShearStress (I section with root fillets)", () => sectionPeakShearStress(1.5e5, rolled));
  bench("stress: sectionPeakShearStress (round bar)", () => sectionPeakShearStress(1e4, bar));
  bench("stress: sectionPeakShearStress (pipe)", () => sectionPeakShearStress(1e4, tube));
  bench("stress: sectionPeakShearStress (half disc on a plate)", () => sectionPeakShearStress(1e4, halfDisc));
});
