/**
 * The nearest member of any family to a point in proper-element space, in the outlier stage's
 * scaled coordinates (outlierMetric.ts: |δz| times a body's n·a is the velocity metric in m/s).
 * A nearest-point search over the family members alone, through a k-d tree (kdTreeNearest.ts),
 * never all pairs. Ties go to the member with the lower index, as in kNearest.ts. The tree is
 * built on the first query, so a run that asks nothing pays nothing. (A uniform grid of the
 * members, about four a cell, was used first: the members are clumped in families, so its cells
 * were small and a query far from every family read shell after shell of empty cells: the
 * 19 911 such queries of a 1.5 M-row main-belt dump against its 105 027 members took 5.1–7.0 s
 * through the grid, 0.26–0.38 s through the tree, and 0.3–0.5 s to build it, on a loaded machine.)
 */
import { KdTreeNearest } from './kdTreeNearest.js';

export interface NearestMember {
  readonly body: number; // index of the member (same numbering as labels), −1 when there is no member
  readonly family: number; // its family label, −1 when there is no member
  readonly scaledDistance: number; // |δz| in scaled coordinates; NaN when there is no member
}

export class FamilyMemberSearch {
  private readonly members: Int32Array; // body indices of the members, ascending
  private readonly xyz: Float64Array;
  private readonly labels: Int32Array;
  private tree: KdTreeNearest | null = null;

  /** `scaledXyz`: interleaved scaled coordinates per body; `labels`: family per body, < 0 for none. */
  constructor(scaledXyz: Float64Array, labels: Int32Array) {
    if (scaledXyz.length !== 3 * labels.length) {
      throw new RangeError(`FamilyMemberSearch: ${scaledXyz.length / 3} bodies of coordinates for ${labels.length} labels`);
    }
    let m = 0;
    for (let j = 0; j < labels.length; j++) if (labels[j] >= 0) m++;
    this.members = new Int32Array(m);
    m = 0;
    for (let j = 0; j < labels.length; j++) if (labels[j] >= 0) this.members[m++] = j;
    this.xyz = scaledXyz;
    this.labels = labels;
  }

  /** Number of family members searched. */
  get memberCount(): number {
    return this.members.length;
  }

  /** The family member nearest to (x, y, z) in scaled coordinates. */
  nearest(x: number, y: number, z: number): NearestMember {
    if (this.members.length === 0) return { body: -1, family: -1, scaledDistance: NaN };
    const tree = this.tree ?? (this.tree = this.buildTree());
    const found = tree.nearest(x, y, z);
    const body = this.members[found.index];
    return { body, family: this.labels[body], scaledDistance: Math.sqrt(found.distanceSquared) };
  }

  private buildTree(): KdTreeNearest {
    const m = this.members.length;
    const pts = new Float64Array(3 * m);
    for (let t = 0; t < m; t++) {
      const j = this.members[t];
      pts[3 * t] = this.xyz[3 * j];
      pts[3 * t + 1] = this.xyz[3 * j + 1];
      pts[3 * t + 2] = this.xyz[3 * j + 2];
    }
    return new KdTreeNearest(pts);
  }
}
