import type { Case } from '../case/case.ts';
import { fitCapacity } from '../model/fit-capacity.ts';

/**
 * The case as the dynamic model takes its stop: where the station that stopped holds its hub by a
 * shrink or press fit, the shaft turns inside the held hub once the torque passes the fit's slip
 * torque, which is a soft jam with that capacity (the lower of it and the case's own
 * `stop.torque_capacity`), with the held hub's parts taken off the shaft (they stay with the jam,
 * and the shaft's own share at the stop is its only inertia there). Otherwise the case unchanged.
 */
export function jamWithFit(c: Case): Case {
  const s = c.stations.find((x) => x.name === c.stop.at);
  if (!s?.fit) return c;
  const slip = fitCapacity(c, s).slipTorque;
  const cap = c.stop.torqueCapacity === undefined ? slip : Math.min(slip, c.stop.torqueCapacity);
  // The held hub and its parts stay with the jam; only the shaft turns in it.
  return { ...c, stop: { ...c.stop, torqueCapacity: cap }, stations: c.stations.map((x) => (x === s ? { ...x, parts: [] } : x)) };
}
