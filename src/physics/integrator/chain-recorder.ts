import type { ChainStepper } from './chain-stepper.ts';

/** Time histories kept for plotting, sampled at about even intervals; arrays share one length. */
export interface ChainHistory {
  /** s. */
  time: Float64Array;
  /** Speed of every chain node, rad/s at shaft speed. */
  nodeSpeed: Float64Array[];
  /** Speed of each drive's motor side (its rotor behind a slipping belt, else its node), rad/s at shaft speed. */
  rotorSpeed: Float64Array[];
  /** Torque in every element (its law's, without the dashpot), N·m, signed (positive when the node toward the shaft's end is ahead). */
  elementTorque: Float64Array[];
  /** Twist of every element, rad, signed as its torque. */
  elementTwist: Float64Array[];
  /** Torque each drive's belt carries, N·m at the shaft (NaN without a belt). */
  beltTorque: Float64Array[];
  /** Torque the shaft puts on the jam, N·m. */
  jamTorque: Float64Array;
}

/**
 * Peaks and sampled histories of an integration. An element's torque for its peak is the larger of
 * its end-face torques (see `record`). Peaks are taken at every step, and where |T| has a
 * local maximum between equal steps the parabola through the three values refines it (an O(h²)
 * better estimate than the largest sample; the step is small against the period, so the parabola
 * is close to the sine it samples).
 */
export class ChainRecorder {
  readonly peak: Float64Array;
  readonly peakTime: Float64Array;
  peakBelt: Float64Array;
  peakJam = 0;
  private readonly a: Float64Array;
  private readonly b: Float64Array;
  private hA = 0;
  private hB = 0;
  private count = 0;
  private next = 0;
  private readonly spacing: number;
  private readonly h: ChainHistory;
  /** Half of each element's own inertia, kg·m². */
  private readonly halfInertia: Float64Array;
  /** Each element's torque limit (`TorqueLaw.torqueLimit`), N·m. */
  private readonly limit: Float64Array;

  constructor(
    private readonly st: ChainStepper,
    duration: number,
    private readonly samples: number,
  ) {
    const m = st.m;
    this.peak = new Float64Array(m);
    this.peakTime = new Float64Array(m);
    this.peakBelt = new Float64Array(st.drives.length);
    this.halfInertia = Float64Array.from(st.sys.elementInertia ?? new Float64Array(m), (j) => j / 2);
    this.limit = Float64Array.from(st.laws, (l) => l.torqueLimit ?? Infinity);
    this.a = new Float64Array(m);
    this.b = new Float64Array(m);
    this.spacing = duration / Math.max(samples - 1, 1);
    const f = () => new Float64Array(samples);
    this.h = {
      time: f(),
      nodeSpeed: Array.from({ length: st.n }, f),
      rotorSpeed: st.drives.map(f),
      elementTorque: Array.from({ length: m }, f),
      elementTwist: Array.from({ length: m }, f),
      beltTorque: st.drives.map(f),
      jamTorque: f(),
    };
  }

  /**
   * Torque element e carries at the committed state, N·m: its law's torque. The dashpot is left
   * out: it stands for energy lost along the drive line (fits, joints, hysteresis), not for a stress
   * in the steel, and a dashpot across a very short element meets the instantaneous stop's jump in
   * speed with a torque that grows without bound as the shaft is split finer.
   */
  elementTorque(e: number): number {
    return this.st.tq[e];
  }

  /** Whether a step ending at t will be kept as a sample. */
  due(t: number): boolean {
    return t >= this.next - 1e-6 * this.spacing && this.count < this.samples;
  }

  /**
   * Books the committed state after a step of length `step` (0 for the start). `belt` and `jam`
   * are the belt torques and the jam torque measured at this state.
   */
  record(step: number, belt: ArrayLike<number>, jam: number, force = false): void {
    const st = this.st;
    const equal = step > 0 && Math.abs(step - this.hB) <= 1e-9 * step && Math.abs(this.hB - this.hA) <= 1e-9 * step;
    const J = this.halfInertia;
    const acc = st.acc;
    for (let e = 0; e < st.m; e++) {
      // The torque at the element's end faces, T − ½j·a₀ and T + ½j·a₁: the half-element slab on
      // each side of the spring is accelerated by the difference. Along a piece of shaft carrying
      // its own inertia, the section torque is largest at a face, and this makes the peak torque
      // converge as 1/n² with the element count, like the frequencies (not as 1/n).
      const T = st.tq[e];
      // No section carries more than its fully plastic torque: the slab correction is an elastic
      // estimate and does not hold across a yielded section.
      const c = Math.min(Math.max(Math.abs(T - J[e] * acc[e]), Math.abs(T + J[e] * acc[e + 1]), Math.abs(T)), this.limit[e]);
      const a = this.a[e];
      const b = this.b[e];
      if (equal && b >= a && b > c) {
        const curv = 2 * b - a - c;
        const top = Math.min(b + ((c - a) * (c - a)) / (8 * curv), this.limit[e]);
        if (top > this.peak[e]) {
          this.peak[e] = top;
          this.peakTime[e] = st.t - step + (step * (a - c)) / (2 * (a - 2 * b + c));
        }
      }
      if (c > this.peak[e]) {
        this.peak[e] = c;
        this.peakTime[e] = st.t;
      }
      this.a[e] = b;
      this.b[e] = c;
    }
    this.hA = this.hB;
    this.hB = step;
    for (let i = 0; i < belt.length; i++) if (Math.abs(belt[i]) > this.peakBelt[i]) this.peakBelt[i] = Math.abs(belt[i]);
    if (Math.abs(jam) > this.peakJam) this.peakJam = Math.abs(jam);
    if ((this.due(st.t) || force) && this.count < this.samples) this.sample(belt, jam);
  }

  private sample(belt: ArrayLike<number>, jam: number): void {
    const { st, h } = this;
    const k = this.count++;
    h.time[k] = st.t;
    for (let i = 0; i < st.n; i++) h.nodeSpeed[i][k] = st.v[i];
    for (let i = 0; i < st.drives.length; i++) h.rotorSpeed[i][k] = st.motorSpeed(st.drives[i], false);
    for (let e = 0; e < st.m; e++) {
      h.elementTorque[e][k] = this.elementTorque(e);
      h.elementTwist[e][k] = st.theta[e];
    }
    for (let i = 0; i < belt.length; i++) h.beltTorque[i][k] = belt[i];
    h.jamTorque[k] = jam;
    while (this.next <= st.t + 1e-6 * this.spacing) this.next += this.spacing;
  }

  /** The histories, trimmed to the samples taken. */
  history(): ChainHistory {
    const n = this.count;
    const cut = (a: Float64Array) => a.slice(0, n);
    const h = this.h;
    return {
      time: cut(h.time),
      nodeSpeed: h.nodeSpeed.map(cut),
      rotorSpeed: h.rotorSpeed.map(cut),
      elementTorque: h.elementTorque.map(cut),
      elementTwist: h.elementTwist.map(cut),
      beltTorque: h.beltTorque.map(cut),
      jamTorque: cut(h.jamTorque),
    };
  }
}
