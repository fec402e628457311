/**
 * The numbers of one solve, in flat typed arrays indexed by what the compiler resolved
 * (value slot, point, joint, member, load). Compiled expressions read from it directly.
 */
export class SolveEnv {
  /** Inputs, then derived values, then results. */
  readonly v: Float64Array;
  readonly px: Float64Array;
  readonly py: Float64Array;
  /** Force on each joint's first part from its second, and its normal / tangential parts. */
  readonly jfx: Float64Array;
  readonly jfy: Float64Array;
  readonly jn: Float64Array;
  readonly jt: Float64Array;
  /** Axial force of each two-force member, tension positive. */
  readonly axial: Float64Array;
  /** Each load's force and (signed) magnitude; couples hold their moment in lmag. */
  readonly lfx: Float64Array;
  readonly lfy: Float64Array;
  readonly lmag: Float64Array;

  constructor(sizes: { values: number; points: number; joints: number; members: number; loads: number }) {
    this.v = new Float64Array(sizes.values);
    this.px = new Float64Array(sizes.points);
    this.py = new Float64Array(sizes.points);
    this.jfx = new Float64Array(sizes.joints);
    this.jfy = new Float64Array(sizes.joints);
    this.jn = new Float64Array(sizes.joints);
    this.jt = new Float64Array(sizes.joints);
    this.axial = new Float64Array(sizes.members);
    this.lfx = new Float64Array(sizes.loads);
    this.lfy = new Float64Array(sizes.loads);
    this.lmag = new Float64Array(sizes.loads);
  }
}
