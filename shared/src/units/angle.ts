export const RAD_PER_DEG = Math.PI / 180;

export function degToRad(degrees: number): number {
  return degrees * RAD_PER_DEG;
}

export function radToDeg(radians: number): number {
  return radians / RAD_PER_DEG;
}
