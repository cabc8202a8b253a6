/**
 * Synthetic LiPo logs with known truth, for tests, demos and the benchmark. Each cell is an
 * equivalent circuit: open-circuit voltage OCV(state of charge) in series with R0 and one
 * R1‖C1 pair, both scaled with temperature by the same Arrhenius law the analysis uses, and a
 * lumped thermal model (heat I²R0 + V1²/R1, loss to ambient through a thermal resistance).
 * Seeded and dependency-free: the same options always give the same log.
 */
import { DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL, arrheniusFactor } from "../analysis/arrhenius";

export type EcmOptions = {
  seed?: number;
  cells?: number;
  capacityMah?: number;
  /** R0 per cell at 25 °C, mΩ. */
  r0PerCellMohm?: number;
  /** R1 of the RC pair per cell at 25 °C, mΩ, and its time constant. */
  r1PerCellMohm?: number;
  tau1S?: number;
  /** Main discharge current; `cRate` (× capacity in Ah) is used when it is not given. */
  loadCurrentA?: number;
  cRate?: number;
  cutoffVPerCell?: number;
  startSoc?: number;
  ambientC?: number;
  startTemperatureC?: number;
  sampleIntervalS?: number;
  /** Irregular sampling: each interval is stretched by a random factor in [1 − j, 1 + j]. */
  jitter?: number;
  initialRestS?: number;
  /** 0.2 It for 10 s then 1 It for 1 s (IEC 61960-3 two-level DC resistance), then a rest. */
  iecPrelude?: boolean;
  preludeRestS?: number;
  finalRestS?: number;
  noise?: { voltageV?: number; currentA?: number; temperatureC?: number };
  /** Fixed per-cell OCV offsets are drawn with this standard deviation (V). */
  cellSpreadV?: number;
  /** Fixed per-cell voltage offsets (V), cell 1 first, instead of drawn ones (a weak cell: [-0.2, 0.07, …]). */
  cellOffsetsV?: number[];
  /**
   * Load current ripple (a PWM-driven load): every sample interval of a discharge phase draws its own
   * current, uniformly within ±fraction of the set current (0.2 = ±20 %); the log shows that current.
   */
  rippleFraction?: number;
  /** Discharges in the log (default 1): after each, a rest, a charge back to full and a rest. */
  cycles?: number;
  /** Charging current between cycles (A, default 0.5 It), the rest after charging (s, default 60). */
  chargeCurrentA?: number;
  chargeRestS?: number;
  /** Capacity lost per cycle as a fraction of the first cycle's (default 0). */
  fadePerCycle?: number;
  activationEnergyKJPerMol?: number;
  heatCapacityJPerKPerCell?: number;
  thermalResistanceKPerWPerCell?: number;
  holdDelayS?: number;
  /** Stop after this many samples (the benchmark's fixed-size log). */
  maxSamples?: number;
};

export type EcmRow = {
  timeS: number;
  voltageV: number;
  currentA: number;
  temperatureC: number;
  cellVoltagesV: number[];
};

export type EcmTruth = {
  cells: number;
  capacityMah: number;
  loadCurrentA: number;
  restVoltageV: number;
  /** Delivered over every discharge phase (prelude included), exact for piecewise-constant current. */
  deliveredMah: number;
  deliveredWh: number;
  /** Each discharge (prelude pulses included in the first), in log order. */
  discharges: { startS: number; deliveredMah: number; deliveredWh: number; reachedCutoff: boolean }[];
  mainDeliveredMah: number;
  mainDeliveredWh: number;
  mainDurationS: number;
  mainStartS: number;
  minVoltageV: number;
  holdVoltagePerCellV: number;
  startTemperatureC: number;
  peakTemperatureC: number;
  r0PackMohm25C: number;
  /** What an ideal, noise-free rest→load reading 1 s into the main discharge gives (pack, mΩ). */
  stepResistanceMohm: number;
  /** What an ideal IEC 61960-3 two-level reading gives (pack, mΩ); null without the prelude. */
  iecResistanceMohm: number | null;
  resistanceTemperatureC: number;
  durationS: number;
  samples: number;
  reachedCutoff: boolean;
};

/** Typical LiPo (LiCoO₂/graphite) rest voltage against state of charge, per cell (from memory). */
const OCV_SOC = [0, 0.02, 0.05, 0.1, 0.15, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 1];
const OCV_V = [3.0, 3.3, 3.5, 3.62, 3.68, 3.71, 3.75, 3.79, 3.83, 3.88, 3.94, 4.01, 4.09, 4.14, 4.2];

export function ocvPerCellV(soc: number): number {
  if (soc <= 0) return 3.0 + soc * 15;
  if (soc >= 1) return 4.2 + (soc - 1) * 1.2;
  let k = 1;
  while ((OCV_SOC[k] as number) < soc) k++;
  const s0 = OCV_SOC[k - 1] as number;
  const s1 = OCV_SOC[k] as number;
  const v0 = OCV_V[k - 1] as number;
  return v0 + ((OCV_V[k] as number) - v0) * ((soc - s0) / (s1 - s0));
}

/** mulberry32: a small, fast, well-mixed 32-bit PRNG. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Phase = { currentA: number; durationS: number; toCutoff: boolean; main: boolean; toFull?: boolean };

/** Steps the circuit sample by sample; `row` is reused (copy it to keep it). */
export class EcmSimulator {
  readonly row: EcmRow;
  readonly truth: EcmTruth;
  private readonly o: Required<
    Omit<
      EcmOptions,
      | "loadCurrentA"
      | "noise"
      | "startTemperatureC"
      | "maxSamples"
      | "cellOffsetsV"
      | "rippleFraction"
      | "cycles"
      | "chargeCurrentA"
      | "chargeRestS"
      | "fadePerCycle"
    >
  >;
  private readonly rand: () => number;
  private readonly phases: Phase[];
  private readonly offsets: number[];
  private readonly noise: { voltageV: number; currentA: number; temperatureC: number };
  private readonly maxSamples: number;
  private phase = 0;
  private phaseEndS: number;
  private t = 0;
  private soc: number;
  private v1 = 0; // RC pair voltage per cell
  private tempC: number;
  private started = false;
  private done = false;
  private events: { atS: number; kind: "hold" | "step" | "iec-low" | "iec-high" }[] = [];
  private iecU1 = Number.NaN;
  private readonly ripple: number;
  private readonly fadePerCycle: number;
  private readonly firstCapacityMah: number;
  private capacityMah: number;
  /** Index of the charge/discharge cycle in progress (0 = the first discharge). */
  private cycle = 0;
  private mainRestV = Number.NaN;

  constructor(options: EcmOptions = {}) {
    const capacityMah = options.capacityMah ?? 5000;
    const cRate = options.cRate ?? 1;
    this.o = {
      seed: options.seed ?? 1,
      cells: options.cells ?? 4,
      capacityMah,
      r0PerCellMohm: options.r0PerCellMohm ?? 3,
      r1PerCellMohm: options.r1PerCellMohm ?? 1.5,
      tau1S: options.tau1S ?? 20,
      cRate,
      cutoffVPerCell: options.cutoffVPerCell ?? 3.3,
      startSoc: options.startSoc ?? 1,
      ambientC: options.ambientC ?? 25,
      sampleIntervalS: options.sampleIntervalS ?? 1,
      jitter: options.jitter ?? 0,
      initialRestS: options.initialRestS ?? 10,
      iecPrelude: options.iecPrelude ?? false,
      preludeRestS: options.preludeRestS ?? 30,
      finalRestS: options.finalRestS ?? 10,
      cellSpreadV: options.cellSpreadV ?? 0,
      activationEnergyKJPerMol: options.activationEnergyKJPerMol ?? DEFAULT_ACTIVATION_ENERGY_KJ_PER_MOL,
      heatCapacityJPerKPerCell: options.heatCapacityJPerKPerCell ?? capacityMah * 0.024,
      thermalResistanceKPerWPerCell: options.thermalResistanceKPerWPerCell ?? 10,
      holdDelayS: options.holdDelayS ?? 10,
    };
    const o = this.o;
    const loadA = options.loadCurrentA ?? (cRate * capacityMah) / 1000;
    const itA = capacityMah / 1000;
    this.noise = { voltageV: 0, currentA: 0, temperatureC: 0, ...options.noise };
    this.maxSamples = options.maxSamples ?? 5_000_000;
    this.rand = seededRandom(o.seed);
    this.offsets = options.cellOffsetsV
      ? Array.from({ length: o.cells }, (_, k) => options.cellOffsetsV?.[k] ?? 0)
      : Array.from({ length: o.cells }, () => this.gauss() * o.cellSpreadV);
    const mean = this.offsets.reduce((a, b) => a + b, 0) / o.cells;
    this.offsets = this.offsets.map((x) => x - mean);
    this.soc = o.startSoc;
    this.tempC = options.startTemperatureC ?? o.ambientC;
    const rest = (durationS: number): Phase => ({ currentA: 0, durationS, toCutoff: false, main: false });
    this.phases = [rest(o.initialRestS)];
    if (o.iecPrelude) {
      this.phases.push(
        { currentA: 0.2 * itA, durationS: 10, toCutoff: false, main: false },
        { currentA: itA, durationS: 1, toCutoff: false, main: false },
        rest(o.preludeRestS),
      );
    }
    this.phases.push(
      { currentA: loadA, durationS: Number.POSITIVE_INFINITY, toCutoff: true, main: true },
      rest(o.finalRestS),
    );
    for (let k = 1; k < (options.cycles ?? 1); k++) {
      const chargeA = options.chargeCurrentA ?? 0.5 * itA;
      this.phases.push(
        { currentA: -chargeA, durationS: Number.POSITIVE_INFINITY, toCutoff: false, main: false, toFull: true },
        rest(options.chargeRestS ?? 60),
        { currentA: loadA, durationS: Number.POSITIVE_INFINITY, toCutoff: true, main: true },
        rest(o.finalRestS),
      );
    }
    this.ripple = options.rippleFraction ?? 0;
    this.fadePerCycle = options.fadePerCycle ?? 0;
    this.firstCapacityMah = capacityMah;
    this.capacityMah = capacityMah;
    this.phaseEndS = this.phases[0]?.durationS ?? 0;
    this.row = {
      timeS: 0,
      voltageV: 0,
      currentA: 0,
      temperatureC: 0,
      cellVoltagesV: new Array<number>(o.cells).fill(0),
    };
    const r0Pack = o.r0PerCellMohm * o.cells;
    this.truth = {
      cells: o.cells,
      capacityMah,
      loadCurrentA: loadA,
      restVoltageV: this.packV(0),
      deliveredMah: 0,
      deliveredWh: 0,
      discharges: [],
      mainDeliveredMah: 0,
      mainDeliveredWh: 0,
      mainDurationS: 0,
      mainStartS: Number.NaN,
      minVoltageV: Number.POSITIVE_INFINITY,
      holdVoltagePerCellV: Number.NaN,
      startTemperatureC: this.tempC,
      peakTemperatureC: this.tempC,
      r0PackMohm25C: r0Pack,
      stepResistanceMohm: Number.NaN,
      iecResistanceMohm: null,
      resistanceTemperatureC: this.tempC,
      durationS: 0,
      samples: 0,
      reachedCutoff: false,
    };
    if (o.iecPrelude)
      this.events.push({ atS: o.initialRestS + 10, kind: "iec-low" }, { atS: o.initialRestS + 11, kind: "iec-high" });
  }

  private gauss(): number {
    const u = 1 - this.rand();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * this.rand());
  }

  private resistanceScale(): number {
    return arrheniusFactor(25, this.tempC, this.o.activationEnergyKJPerMol);
  }

  /** Noise-free pack voltage now, with `currentA` flowing. */
  private packV(currentA: number): number {
    const perCell = ocvPerCellV(this.soc) - (currentA * this.o.r0PerCellMohm * this.resistanceScale()) / 1000 - this.v1;
    return perCell * this.o.cells;
  }

  /** Advances the state by dt at constant current (exact for SoC and the RC pair). */
  private advance(dt: number, currentA: number): void {
    if (!(dt > 0)) return;
    const o = this.o;
    const scale = this.resistanceScale();
    const r0 = (o.r0PerCellMohm * scale) / 1000;
    const r1 = (o.r1PerCellMohm * scale) / 1000;
    const vStart = this.packV(currentA);
    const decay = Math.exp(-dt / o.tau1S);
    const v1Mid = this.v1 * Math.exp(-dt / (2 * o.tau1S)) + currentA * r1 * (1 - Math.exp(-dt / (2 * o.tau1S)));
    const socMid = this.soc - (currentA * dt) / 2 / 3.6 / this.capacityMah;
    const vMid = (ocvPerCellV(socMid) - currentA * r0 - v1Mid) * o.cells;
    const heatW = currentA * currentA * r0 + (r1 > 0 ? (this.v1 * this.v1) / r1 : 0);
    this.v1 = this.v1 * decay + currentA * r1 * (1 - decay);
    this.soc -= (currentA * dt) / 3.6 / this.capacityMah;
    const cth = o.heatCapacityJPerKPerCell;
    const rth = o.thermalResistanceKPerWPerCell;
    const steady = o.ambientC + heatW * rth;
    this.tempC = steady + (this.tempC - steady) * Math.exp(-dt / (cth * rth));
    if (currentA > 0) {
      const vEnd = this.packV(currentA);
      const energyWs = ((vStart + 4 * vMid + vEnd) / 6) * currentA * dt; // Simpson's rule
      this.truth.deliveredMah += (currentA * dt) / 3.6;
      this.truth.deliveredWh += energyWs / 3600;
      const discharges = this.truth.discharges;
      if (discharges.length <= this.cycle)
        discharges.push({ startS: this.t, deliveredMah: 0, deliveredWh: 0, reachedCutoff: false });
      const d = discharges[this.cycle];
      if (d) {
        d.deliveredMah += (currentA * dt) / 3.6;
        d.deliveredWh += energyWs / 3600;
      }
      if (this.phases[this.phase]?.main && this.cycle === 0) {
        this.truth.mainDeliveredMah += (currentA * dt) / 3.6;
        this.truth.mainDeliveredWh += energyWs / 3600;
      }
    }
    if (this.tempC > this.truth.peakTemperatureC) this.truth.peakTemperatureC = this.tempC;
  }

  private onEvent(kind: string, currentA: number): void {
    const truth = this.truth;
    const v = this.packV(currentA);
    if (kind === "hold") truth.holdVoltagePerCellV = v / this.o.cells;
    else if (kind === "step") {
      truth.stepResistanceMohm = ((this.mainRestV - v) / currentA) * 1000;
      truth.resistanceTemperatureC = this.tempC;
    } else if (kind === "iec-low") this.iecU1 = v;
    else if (kind === "iec-high") {
      const itA = this.o.capacityMah / 1000;
      truth.iecResistanceMohm = ((this.iecU1 - v) / (itA - 0.2 * itA)) * 1000;
      truth.resistanceTemperatureC = this.tempC;
    }
  }

  /** Moves to the next sample. Returns false when the log is over. */
  next(): boolean {
    if (this.done || this.truth.samples >= this.maxSamples) return false;
    const o = this.o;
    // Regular sampling uses k·interval, not a running sum, so phase edges stay on the grid.
    let target = this.t;
    if (this.started) {
      target =
        o.jitter > 0
          ? this.t + o.sampleIntervalS * (1 + (2 * this.rand() - 1) * o.jitter)
          : this.truth.samples * o.sampleIntervalS;
      if (Math.abs(target - this.phaseEndS) < 1e-9 * Math.max(1, target)) target = this.phaseEndS;
    }
    // One ripple factor per sample interval (drawn only when ripple is asked for, so other logs keep their random stream).
    const factor = this.ripple > 0 && this.started ? 1 + this.ripple * (2 * this.rand() - 1) : 1;
    const flowing = (phase: Phase) => (phase.currentA > 0 ? phase.currentA * factor : phase.currentA);
    let current = this.phases[this.phase]?.currentA ?? 0;
    while (this.t < target) {
      const phase = this.phases[this.phase];
      if (!phase) break;
      const eventAt = this.events[0]?.atS ?? Number.POSITIVE_INFINITY;
      const stop = Math.min(target, this.phaseEndS, eventAt);
      this.advance(stop - this.t, flowing(phase));
      this.t = stop;
      current = flowing(phase);
      if (stop === eventAt) this.onEvent(this.events.shift()?.kind ?? "", phase.currentA);
      if (stop === this.phaseEndS && stop < target) this.enterPhase(this.phase + 1);
    }
    if (this.t >= this.phaseEndS && this.phase < this.phases.length - 1 && !this.started)
      this.enterPhase(this.phase + 1);
    this.started = true;
    return this.emit(current);
  }

  private enterPhase(index: number): void {
    this.phase = index;
    const phase = this.phases[index];
    if (!phase) {
      this.done = true;
      return;
    }
    this.phaseEndS = this.t + phase.durationS;
    if (phase.toFull) this.cycle++;
    if (phase.main && this.cycle > 0) this.capacityMah = this.firstCapacityMah * (1 - this.fadePerCycle * this.cycle);
    if (!phase.main) this.events = this.events.filter((e) => e.kind !== "step" && e.kind !== "hold");
    if (phase.main && this.cycle === 0) {
      this.truth.mainStartS = this.t;
      this.truth.startTemperatureC = this.tempC;
      this.mainRestV = this.packV(0);
      this.events.push({ atS: this.t + 1, kind: "step" }, { atS: this.t + this.o.holdDelayS, kind: "hold" });
      this.events.sort((a, b) => a.atS - b.atS);
    }
  }

  private emit(currentA: number): boolean {
    const o = this.o;
    const truth = this.truth;
    const v = this.packV(currentA);
    const phase = this.phases[this.phase];
    if (currentA > 0 && v < truth.minVoltageV) truth.minVoltageV = v;
    const row = this.row;
    row.timeS = this.t;
    row.voltageV = v + this.gauss() * this.noise.voltageV;
    row.currentA = currentA + this.gauss() * this.noise.currentA;
    row.temperatureC = this.tempC + this.gauss() * this.noise.temperatureC;
    for (let k = 0; k < o.cells; k++) row.cellVoltagesV[k] = v / o.cells + (this.offsets[k] as number);
    truth.samples++;
    truth.durationS = this.t;
    // Past empty (or a voltage that never falls) ends the discharge too, so a log always ends.
    if (phase?.toCutoff && (v <= o.cutoffVPerCell * o.cells || !(this.soc > -0.2))) {
      const d = truth.discharges[this.cycle];
      if (d) d.reachedCutoff = true;
      if (this.cycle === 0) {
        truth.reachedCutoff = true;
        truth.mainDurationS = this.t - truth.mainStartS;
      }
      this.phaseEndS = this.t;
      this.enterPhase(this.phase + 1);
    } else if (phase?.toFull && this.soc >= 1) {
      this.phaseEndS = this.t;
      this.enterPhase(this.phase + 1);
    } else if (phase?.main && this.cycle === 0) truth.mainDurationS = this.t - truth.mainStartS;
    if (this.phase >= this.phases.length - 1 && this.t >= this.phaseEndS) this.done = true;
    return true;
  }
}

/** Runs the circuit and keeps every sample. */
export function generateLog(options: EcmOptions = {}): { rows: EcmRow[]; truth: EcmTruth } {
  const sim = new EcmSimulator(options);
  const rows: EcmRow[] = [];
  while (sim.next()) rows.push({ ...sim.row, cellVoltagesV: sim.row.cellVoltagesV.slice() });
  return { rows, truth: sim.truth };
}
