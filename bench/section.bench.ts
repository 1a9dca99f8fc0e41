import { bench, suite } from "./harness.js";
import {
  builtUp,
  centreLineModel,
  channel,
  closedSectionTorsion,
  fullyPlasticMoments,
  openSectionProperties,
  principalAxisProperties,
  torsionConstantRolledI,
  type WallModel,
  firstMomentAbove,
  iSection,
  plasticProperties,
  rectangle,
  section,
  sectionProperties,
  translateSection,
  type Section,
  type SectionPart,
  type SectionPoint,
} from "../src/section/index.js";

// An invented strengthened beam: a rolled-style I with root fillets (7 parts), a cover plate on
// the top flange (1) and two bolt holes through cover plate and flange (2; in the cross-section a
// vertical hole through the plates is a rectangle): ten parts, two of them holes.
const beam = iSection({ depth: 406, flangeWidth: 178, flangeThickness: 12.8, webThickness: 7.8, rootRadius: 10.2 });
const cover = translateSection(rectangle({ width: 220, depth: 15 }), { y: 203 + 7.5, z: 0 });
const boltHole = (z: number): SectionPart => ({ ...translateSection(rectangle({ width: 22, depth: 27.8 }), { y: 204.1, z }).parts[0]!, hole: true });
const tenParts: Section = builtUp([beam, cover, boltHole(-60), boltHole(60)]);
// the same section as plain data (as read from a file): checked on every call
const tenPartsPlain: Section = JSON.parse(JSON.stringify(tenParts)) as Section;

// An invented 1,000-corner outline (a wavy disc)
const wavy: SectionPoint[] = Array.from({ length: 1000 }, (_, i) => {
  const t = (2 * Math.PI * i) / 1000;
  const r = 100 + 8 * Math.sin(12 * t);
  return { y: r * Math.sin(t), z: r * Math.cos(t) };
});
const wavySection = section([{ kind: "polygon", points: wavy }]);
const wavyPlain: Section = { parts: [{ kind: "polygon", points: wavy }] };

// Stability properties: an invented rolled-style I with fillets and a cover plate (centre-line model
// with a link), a channel, and an invented two-cell box girder with flange outstands.
const coverPlated = builtUp([beam, cover]);
const aChannel = channel({ depth: 300, flangeWidth: 90, flangeThickness: 13, webThickness: 9, rootRadius: 12 });
const wall = (z0: number, y0: number, z1: number, y1: number, thickness: number) => ({ start: { y: y0, z: z0 }, end: { y: y1, z: z1 }, thickness });
const girder: WallModel = {
  kind: "wall-model",
  plates: [
    wall(-1200, 600, 0, 600, 20), wall(0, 600, 1200, 600, 20), wall(1200, 600, 1200, -600, 14), wall(1200, -600, 0, -600, 16),
    wall(0, -600, -1200, -600, 16), wall(-1200, -600, -1200, 600, 14), wall(0, 600, 0, -600, 12), wall(1200, 600, 1500, 600, 20), wall(-1200, 600, -1500, 600, 20),
  ],
};
const plates = (fy: number) => ({ material: { elasticModulus: 210e3, yieldStrength: fy } });
const hybrid = builtUp([iSection({ depth: 406, flangeWidth: 178, flangeThickness: 12.8, webThickness: 7.8 }, plates(355)), translateSection(rectangle({ width: 220, depth: 15 }, plates(460)), { y: 203 + 7.5, z: 0 })]);

suite("section", () => {
  bench("section: centreLineModel (I with fillets and a cover plate)", () => centreLineModel(coverPlated));
  bench("section: openSectionProperties (I with fillets and a cover plate)", () => openSectionProperties(coverPlated));
  bench("section: openSectionProperties (channel with fillets)", () => openSectionProperties(aChannel));
  bench("section: closedSectionTorsion (two-cell box girder with outstands)", () => closedSectionTorsion(girder));
  bench("section: torsionConstantRolledI", () => torsionConstantRolledI({ depth: 406, flangeWidth: 178, flangeThickness: 12.8, webThickness: 7.8, rootRadius: 10.2 }));
  bench("section: principalAxisProperties (10 parts, 2 holes)", () => principalAxisProperties(tenParts));
  bench("section: fullyPlasticMoments (two materials)", () => fullyPlasticMoments(hybrid));
  bench("section: sectionProperties (10 parts, 2 holes)", () => sectionProperties(tenParts));
  bench("section: sectionProperties (10 parts, plain data: checks included)", () => sectionProperties(tenPartsPlain));
  bench("section: firstMomentAbove (10 parts, one cut)", () => firstMomentAbove(tenParts, 150));
  bench("section: plasticProperties (10 parts, 2 holes)", () => plasticProperties(tenParts));
  bench("section: sectionProperties (1,000-vertex polygon)", () => sectionProperties(wavySection));
  bench("section: sectionProperties (1,000-vertex polygon, plain data)", () => sectionProperties(wavyPlain));
  bench("section: section() builds and checks the 10-part section", () => builtUp([beam, cover, boltHole(-60), boltHole(60)]));
});
