/** Reusable column arrays for one batch of samples (time-ordered), filled by the sample sink. */
export class SampleBatch {
  timeS = new Float64Array(0);
  voltageV = new Float64Array(0);
  currentA = new Float64Array(0);
  temperatureC = new Float64Array(0);
  minCellVoltageV = new Float64Array(0);
  /** Highest minus lowest cell voltage of the sample (0 without cell columns). */
  cellSpreadV = new Float64Array(0);
  /** Running charge after each sample, written by the accumulator for the curve. */
  positiveChargeAs = new Float64Array(0);
  negativeChargeAs = new Float64Array(0);

  reserve(size: number): void {
    if (this.timeS.length >= size) return;
    const n = Math.max(size, 1024);
    this.timeS = new Float64Array(n);
    this.voltageV = new Float64Array(n);
    this.currentA = new Float64Array(n);
    this.temperatureC = new Float64Array(n);
    this.minCellVoltageV = new Float64Array(n);
    this.cellSpreadV = new Float64Array(n);
    this.positiveChargeAs = new Float64Array(n);
    this.negativeChargeAs = new Float64Array(n);
  }
}
