/**
 * Instance matrices for repeated box-shaped parts (bracket arms, struts, posts, rail pieces, caps,
 * columns): a unit cube centred on the origin is stretched between two scene points. Column-major,
 * as three.js Matrix4.elements and InstancedMesh.instanceMatrix expect.
 */
import { nearlyZero, POINT_TOLERANCE } from '@/lib/units';

/**
 * Writes at `out[16*index]` the matrix that maps the unit cube to a box from a to b (its length
 * axis), `height` across in the vertical plane through a→b and `width` across horizontally.
 * A vertical a→b takes `width` along scene x and `height` along scene z.
 */
export function writeBeamMatrix(out: Float32Array, index: number, ax: number, ay: number, az: number, bx: number, by: number, bz: number, width: number, height: number): void {
  let dx = bx - ax;
  let dy = by - ay;
  let dz = bz - az;
  const len = Math.hypot(dx, dy, dz);
  if (nearlyZero(len)) {
    dx = 1;
    dy = 0;
    dz = 0;
  } else {
    dx /= len;
    dy /= len;
    dz /= len;
  }
  // z axis = x × ref, ref = up unless the box is (nearly) vertical.
  const vertical = Math.abs(dy) > 0.999;
  const rx = vertical ? 1 : 0;
  const ry = vertical ? 0 : 1;
  let zx = dy * 0 - dz * ry;
  let zy = dz * rx - dx * 0;
  let zz = dx * ry - dy * rx;
  const zl = Math.hypot(zx, zy, zz) || 1;
  zx /= zl;
  zy /= zl;
  zz /= zl;
  // y axis = z × x
  const yx = zy * dz - zz * dy;
  const yy = zz * dx - zx * dz;
  const yz = zx * dy - zy * dx;
  const o = index * 16;
  const l = Math.max(len, POINT_TOLERANCE);
  const hx = vertical ? width : height;
  const wz = vertical ? height : width;
  out[o] = dx * l;
  out[o + 1] = dy * l;
  out[o + 2] = dz * l;
  out[o + 3] = 0;
  out[o + 4] = yx * hx;
  out[o + 5] = yy * hx;
  out[o + 6] = yz * hx;
  out[o + 7] = 0;
  out[o + 8] = zx * wz;
  out[o + 9] = zy * wz;
  out[o + 10] = zz * wz;
  out[o + 11] = 0;
  out[o + 12] = (ax + bx) / 2;
  out[o + 13] = (ay + by) / 2;
  out[o + 14] = (az + bz) / 2;
  out[o + 15] = 1;
}

/** Applies a column-major 4×4 matrix (at out[16*index]) to a point; for tests and picking. */
export function applyMatrix(m: Float32Array, index: number, x: number, y: number, z: number): [number, number, number] {
  const o = index * 16;
  return [m[o] * x + m[o + 4] * y + m[o + 8] * z + m[o + 12], m[o + 1] * x + m[o + 5] * y + m[o + 9] * z + m[o + 13], m[o + 2] * x + m[o + 6] * y + m[o + 10] * z + m[o + 14]];
}
