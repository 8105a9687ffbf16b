/**
 * Finds grid cells given twice. Two cells count as the same when their centres agree to 1e-5 degrees
 * (about a metre), far finer than any population or site-condition grid.
 */
export class CellKeys {
  private readonly firstRowByKey = new Map<number, number>();

  /** Records a cell; returns the row number where the same cell was first seen, or undefined. */
  seen(lonDeg: number, latDeg: number, rowNumber: number): number | undefined {
    // Both in units of 1e-5 degree: |lon| ≤ 1.8e7 and lat + 9e6 ≤ 1.8e7 < 2e7, so the key fits in 53 bits.
    const key = Math.round(lonDeg * 1e5) * 2e7 + (Math.round(latDeg * 1e5) + 9e6);
    const first = this.firstRowByKey.get(key);
    if (first === undefined) this.firstRowByKey.set(key, rowNumber);
    return first;
  }
}
