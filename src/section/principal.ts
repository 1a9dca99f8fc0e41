import type { PrincipalAxes } from "./propertyTypes.js";

/**
 * Principal second moments and the angle of the major axis from centroidal I_z, I_y, I_yz:
 * I = (I_z + I_y)/2 +- sqrt(((I_z - I_y)/2)^2 + I_yz^2), tan 2 theta = -2 I_yz / (I_z - I_y)
 * (Gere and Goodno, Mechanics of Materials, chapter 12: rotation of axes, principal axes).
 */
export function principalAxes(iz: number, iy: number, iyz: number): PrincipalAxes {
  const mean = (iz + iy) / 2;
  const half = (iz - iy) / 2;
  const radius = Math.hypot(half, iyz);
  const scale = Math.max(Math.abs(iz), Math.abs(iy));
  let angle = 0;
  if (radius > 1e-13 * scale) {
    angle = Math.atan2(-iyz, half) / 2;
    if (angle <= -Math.PI / 2 + 1e-15) angle += Math.PI;
  }
  return { major: mean + radius, minor: mean - radius, angle: angle + 0 };
}
