import type { Drive, Station } from '../case/case.ts';
import { reflectedInertia } from '../physics/inertia.ts';
import { capLine, motorLine, reflectLine, torqueAt, type TorqueSpeedLine } from '../physics/motor-torque.ts';
import { beltSlip, type BeltSlip } from '../physics/slip.ts';
import { forwardTorque } from '../physics/gear-stage.ts';

/** A drive as the chain carries it: everything at the machine shaft. */
export interface ChainDrive {
  station: string;
  /** The chain node the drive turns. */
  node: number;
  drive: Drive;
  /** The rotor's inertia at shaft speed, kg·m² (behind the belt with one, else already in the node). */
  rotorInertia: number;
  /** The belt's slip torque and its capstan working; undefined without a belt. */
  belt?: BeltSlip;
  /** Motor torque against shaft speed, reflected through the speed ratio. */
  line: TorqueSpeedLine;
  /** Running torque at the shaft before the stop, N·m (0 when nothing gives it). */
  runningTorque: number;
  /** How the motor's torques were settled where the case leaves them open, as sentences. */
  assumptions: string[];
  /** What the reader must weigh in how they were settled (a drive given only by its power), as sentences for `Results.warnings`. */
  warnings: string[];
}

/**
 * Settles a station's drive for the chain. The torque while pulled down: the case's `torque` or
 * `curve`; else the running torque held; else power ÷ motor speed held; else none (a motor that
 * tripped). The running torque (the shaft's twist before the stop): the case's `running_torque`;
 * else the curve at the motor's speed; else power ÷ motor speed; else none. Through a station's
 * gearbox both pass forward at its efficiency, T_shaft = η·r·T_motor (src/physics/gear-stage.ts).
 */
export function chainDrive(s: Station, node: number, shaftSpeed: number): ChainDrive {
  const d = s.drive!;
  const r = d.speedRatio;
  const motorSpeed = shaftSpeed * r;
  const assumptions: string[] = [];
  const warnings: string[] = [];
  const fromPower = d.power !== undefined ? d.power / motorSpeed : undefined;
  let spec = d.torque;
  if (!spec) {
    if (d.runningTorque !== undefined) {
      spec = { kind: 'constant', torque: d.runningTorque };
      assumptions.push(`The motor at "${s.name}" is taken to hold its running torque while it is pulled down (no torque or curve given).`);
    } else if (fromPower !== undefined) {
      spec = { kind: 'constant', torque: fromPower };
      assumptions.push(`The motor at "${s.name}" is taken to hold its rated torque, power ÷ speed, while it is pulled down (no torque or curve given).`);
      // Kept as a constant rated torque rather than a guessed pull-out curve, and said where the
      // reader sees it: a motor pulled down toward standstill gives more than its rated torque
      // (an induction motor's breakdown torque is some 2–3 × rated; NEMA MG 1, design B: at least
      // 200 %; from memory, verify), so this understates what the drive adds.
      warnings.push(
        `The drive at "${s.name}" is given only by its power, so the dynamic model (which the verdict stands on, with this drive acting) holds the rated torque, power ÷ speed, while the jam pulls the motor down. That is unconservative: a motor pulled down toward standstill gives more, an induction motor's breakdown torque being some 2 to 3 times its rated torque (NEMA MG 1 design B: at least 200 %), so the drive's share of the peak torque, twist and damage is likely understated. Give drive.torque or drive.curve from the motor's data.`,
      );
    } else {
      spec = { kind: 'constant', torque: 0 };
      assumptions.push(`The motor at "${s.name}" is taken to give no torque after the stop (no torque, curve, running torque or power given), as if it had tripped at once.`);
    }
  }
  let running = d.runningTorque;
  if (running === undefined) {
    if (d.torque?.kind === 'curve') running = torqueAt(motorLine(d.torque), motorSpeed);
    else if (fromPower !== undefined) {
      running = fromPower;
      assumptions.push(`The shaft at "${s.name}" is taken to run at the motor's rated torque, power ÷ speed, before the stop (no running torque given).`);
    } else {
      running = 0;
      if (spec.kind === 'constant' && spec.torque > 0) assumptions.push(`The shaft at "${s.name}" is taken to be untwisted before the stop (no running torque given).`);
    }
  }
  let line = motorLine(spec);
  if (d.torqueLimit !== undefined) {
    line = capLine(line, d.torqueLimit);
    assumptions.push(`The drive at "${s.name}" holds the motor's torque to at most ${Number(d.torqueLimit.toPrecision(4))} N·m at the motor shaft (its torque limit).`);
    if (running > d.torqueLimit * (1 + 1e-9))
      warnings.push(`The running torque at "${s.name}" is above the drive's torque limit; the shaft is taken to run at the running torque given, and the limit applies from the stop.`);
  }
  if (d.tripAfter !== undefined) assumptions.push(`The drive at "${s.name}" trips ${Number((d.tripAfter * 1000).toPrecision(4))} ms after the stop begins; from then on the motor gives no torque.`);
  const eta = s.gearbox?.efficiency ?? 1;
  if (eta !== 1)
    assumptions.push(
      `The motor's torque at "${s.name}" reaches the shaft through the gearbox at its efficiency ${eta}: T_shaft = ${eta} × ${Number(r.toPrecision(4))} × T_motor; the rotor's inertia is reflected without loss.`,
    );
  const rotorInertia = d.rotorParts.reduce((sum, i) => sum + reflectedInertia(s.parts[i].inertia, s.parts[i].speedRatio) * s.parts[i].count, 0);
  return {
    station: s.name,
    node,
    drive: d,
    rotorInertia,
    ...(d.belt ? { belt: beltSlip(d.belt) } : {}),
    line: { ...reflectLine(line, r), torques: line.torques.map((t) => forwardTorque(t, r, eta)) },
    runningTorque: forwardTorque(running, r, eta),
    assumptions,
    warnings,
  };
}
