import type { Bbox } from "./parsed-layer";

/** Grows a [west, south, east, north] box, degrees, point by point. */
export class BboxBuilder {
  private west = Infinity;
  private south = Infinity;
  private east = -Infinity;
  private north = -Infinity;

  add(lonDeg: number, latDeg: number): void {
    if (lonDeg < this.west) this.west = lonDeg;
    if (lonDeg > this.east) this.east = lonDeg;
    if (latDeg < this.south) this.south = latDeg;
    if (latDeg > this.north) this.north = latDeg;
  }

  /** The box, or [0, 0, 0, 0] when nothing was added. */
  build(): Bbox {
    return this.west === Infinity ? [0, 0, 0, 0] : [this.west, this.south, this.east, this.north];
  }
}
