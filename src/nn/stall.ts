/** When a training's error has flattened: the trigger of in-place growth. */

/** Dynamic Node Creation trigger (Ash 1989), signed form, on the min-so-far training error. */
export class StallDetector {
  private readonly ring: Float64Array;
  private count = 0;
  private minSoFar = Infinity;
  private errorAtStart = NaN;
  constructor(
    private readonly window: number,
    private readonly threshold: number,
  ) {
    this.ring = new Float64Array(window + 1);
  }
  reset(): void {
    this.count = 0;
    this.minSoFar = Infinity;
    this.errorAtStart = NaN;
  }
  /** Records the error of the current epoch; true when the error has flattened. */
  record(error: number): boolean {
    if (error < this.minSoFar) this.minSoFar = error;
    const s = this.count++;
    const w = this.window;
    this.ring[s % (w + 1)] = this.minSoFar;
    if (s === 0) this.errorAtStart = this.minSoFar;
    if (s < w) return false;
    const drop = this.ring[(s - w) % (w + 1)] - this.minSoFar;
    if (!(this.errorAtStart > 0)) return !(drop > 0);
    return drop / this.errorAtStart < this.threshold;
  }
}
