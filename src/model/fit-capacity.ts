import type { Case, Segment, Station } from '../case/case.ts';
import { contactPressure, fitSlipTorque, hubBoreHoopStress } from '../physics/interference-fit.ts';
import { seatSegment } from './hub-seat.ts';

/** What a station's shrink or press fit can hold, from its geometry and the two materials. */
export interface FitCapacity {
  station: string;
  /** The shaft segment the hub sits on; its diameter is the seat's. */
  seat: Segment;
  /** Contact pressure at the seat, Pa (Lamé). */
  contactPressure: number;
  /** Torque at which the fit slips, N·m. */
  slipTorque: number;
  /** Hoop stress at the hub's bore, Pa. */
  hubHoopStress: number;
}

/** The capacity of a station's fit (the station must have one; the reader has checked the materials). */
export function fitCapacity(c: Case, s: Station): FitCapacity {
  const fit = s.fit!;
  const stopAt = c.stations.find((x) => x.name === c.stop.at)!.at;
  const seat = seatSegment(c.shaft.segments, s.at, stopAt);
  const shaft = c.materials[seat.material];
  const hub = c.materials[fit.hubMaterial];
  const p = contactPressure(
    { seatDiameter: seat.diameter, hubOuterDiameter: fit.hubOuterDiameter, shaftBore: seat.bore, interference: fit.interference },
    { elasticModulus: hub.elasticModulus!, poissonRatio: hub.poissonRatio! },
    { elasticModulus: shaft.elasticModulus!, poissonRatio: shaft.poissonRatio! },
  );
  return {
    station: s.name,
    seat,
    contactPressure: p,
    slipTorque: fitSlipTorque(p, fit.friction, seat.diameter, fit.length),
    hubHoopStress: hubBoreHoopStress(p, seat.diameter, fit.hubOuterDiameter),
  };
}
