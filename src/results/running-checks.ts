import type { Chain } from '../model/chain.ts';
import { motorLine, torqueAt } from '../physics/motor-torque.ts';

/**
 * Plain checks on how the case says the drive ran before the stop, as sentences for the warnings:
 * a running torque that does not sit on the motor's curve, and a belt or limiter that would have
 * slipped in normal running.
 */
export function runningChecks(chain: Chain, shaftSpeed: number): string[] {
  const out: string[] = [];
  const P = chain.stopNode;
  for (const d of chain.drives) {
    const spec = d.drive.torque;
    if (spec?.kind === 'curve' && d.drive.runningTorque !== undefined) {
      const onCurve = torqueAt(motorLine(spec), shaftSpeed * d.drive.speedRatio);
      if (Math.abs(onCurve - d.drive.runningTorque) > 0.05 * Math.max(Math.abs(onCurve), d.drive.runningTorque)) {
        out.push(
          `The running torque of the motor at "${d.station}" (${fmt(d.drive.runningTorque)} N·m) is not on its curve at the running speed (${fmt(onCurve)} N·m); the shaft starts twisted by the running torque while the motor gives the curve's torque, so the drive is out of balance from the stop's start.`,
        );
      }
    }
    if (d.belt && d.runningTorque > d.belt.slipTorque) {
      out.push(
        `The belt at "${d.station}" can carry ${fmt(d.belt.slipTorque)} N·m at the shaft, less than the running torque there (${fmt(d.runningTorque)} N·m): it would have slipped in normal running; check the belt data.`,
      );
    }
  }
  chain.elements.forEach((el, e) => {
    if (el.device?.kind !== 'torque limiter') return;
    const through = chain.drives.reduce((s, d) => s + ((d.node < P && e >= d.node && e < P) || (d.node > P && e >= P && e < d.node) ? d.runningTorque : 0), 0);
    if (through > el.device.torque) {
      const seg = el.device.segment;
      out.push(
        `The torque limiter in ${seg.label ? `"${seg.label}"` : `segment ${seg.index + 1}`} is set at ${fmt(el.device.torque)} N·m, below the running torque through it (${fmt(through)} N·m): it would have slipped in normal running; check its setting.`,
      );
    }
  });
  return out;
}

function fmt(x: number): string {
  return Number(x.toPrecision(3)).toString();
}
