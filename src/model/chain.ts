import type { Case, Segment, Station } from '../case/case.ts';
import { reflectedInertia } from '../physics/inertia.ts';
import { compliance, shaftInertia } from '../physics/torsion.ts';
import { chainDrive, type ChainDrive } from './chain-drive.ts';
import { fitCapacity } from './fit-capacity.ts';
import { cutAtStations, type ShaftModel, type ShaftPiece, type SideName } from './shaft-model.ts';

/** A node of the lumped torsional chain. */
export interface ChainNode {
  /** Position along the shaft, m. */
  at: number;
  /** Inertia at shaft speed, kg·m²: the parts of the stations here (not a belt drive's rotor) and the shaft's lumped share. */
  inertia: number;
  /** Stations standing here. */
  stations: string[];
  side: SideName | 'stop';
}

/** A torsional spring between neighbouring nodes: a shaft element, or with shaft inertia off a run of pieces in series. */
export interface ChainElement {
  /** Positions of its ends, m. */
  start: number;
  end: number;
  /** N·m/rad. */
  stiffness: number;
  /** The element's own shaft inertia, kg·m², lumped half on each end node (0 with shaft inertia off). */
  inertia: number;
  /** Indices into `Chain.pieces` it lies in. */
  pieces: number[];
  side: SideName;
  /** The segment whose flexible coupling is in series in this element (its stiffness is in `stiffness`). */
  coupling?: Segment;
  /**
   * The springs in series that make up the element: each piece's length of shaft and each
   * coupling, with its compliance, rad/(N·m) (they sum to 1/`stiffness`). The dampers are taken
   * from these (src/results/element-damping.ts).
   */
  springs: ChainSpring[];
  /** A gap in this element from its segment's `backlash`, rad. */
  backlash?: { gap: number; segment: Segment };
  /**
   * A torque limiter or shear pin in this element, from its segment; or the shrink fit of the
   * station at the element's far end (`station`), which slips like a limiter.
   */
  device?: { kind: 'torque limiter' | 'shear pin' | 'hub fit'; torque: number; segment: Segment; station?: string };
}

/**
 * A node that cannot turn backwards: a station's backstop, or the output of a self-locking gearbox
 * (`back_drivable: false`), whose motor side turns rigidly with the node (gears are rigid in the
 * chain), so that the load side cannot drive the motor side backwards.
 */
export interface ChainHold {
  node: number;
  station: string;
  kind: 'backstop' | 'self-locking gearbox';
}

/** One spring of an element: a length of a segment's shaft, or a segment's coupling. */
export interface ChainSpring {
  kind: 'shaft' | 'coupling';
  segment: Segment;
  /** rad/(N·m). */
  compliance: number;
}

/** A piece of shaft (a segment cut at stations) inside the chain, with its side. */
export interface ChainPiece {
  piece: ShaftPiece;
  side: SideName;
}

/**
 * The lumped-parameter torsional model of a case: nodes in order along the shaft at the stations
 * and element joints, joined by elements (element e joins node e to node e + 1).
 */
export interface Chain {
  nodes: ChainNode[];
  elements: ChainElement[];
  pieces: ChainPiece[];
  stopNode: number;
  drives: ChainDrive[];
  /**
   * The one-way nodes (backstops, self-locking gearboxes) at stations the chain has a node for,
   * other than the stop (which the jam holds already).
   */
  holds: ChainHold[];
  /** Whether the shaft's own inertia is lumped onto the nodes. */
  shaftInertia: boolean;
}

export interface ChainOptions {
  /** Shaft elements to aim at, shared among the pieces by length (at least one each). */
  elements: number;
  shaftInertia: boolean;
}

const EPS = 1e-9;

/**
 * Builds the chain from the stop to the farthest loaded station on each side. Parts count at
 * their station's node as J·ratio²·count (Den Hartog, Mechanical Vibrations, geared systems; from
 * memory, confident), except a belt drive's rotor, which is its own node behind the belt. With
 * shaft inertia, each piece is split into elements and each element's ρ·J_p·L (shared reference
 * 2.4) is lumped half on each end node; shaft outside the chain is lumped onto its end nodes.
 * Without, the nodes are the stop and the loaded stations, joined by the pieces between in series.
 */
export function buildChain(c: Case, model: ShaftModel, opts: ChainOptions): Chain {
  const stop = model.stop;
  const loaded = c.stations.filter((s) => s !== stop && s.parts.length > 0);
  const lo = Math.min(stop.at, ...loaded.map((s) => s.at));
  const hi = Math.max(stop.at, ...loaded.map((s) => s.at));
  const sideOf = (x: number): SideName => (x < stop.at - EPS ? 'A' : 'B');
  const pieces: ChainPiece[] = cutAtStations(c.shaft.segments, c.stations)
    .filter((p) => p.start >= lo - EPS && p.end <= hi + EPS && p.end - p.start > EPS)
    .map((piece) => ({ piece, side: sideOf(0.5 * (piece.start + piece.end)) }));
  const G = (p: ShaftPiece) => c.materials[p.segment.material].shearModulus!;
  const rho = (s: Segment) => c.materials[s.material].density ?? 0;

  // Node positions and the elements between them.
  const positions: number[] = [];
  const elements: ChainElement[] = [];
  if (opts.shaftInertia) {
    const total = pieces.reduce((s, p) => s + p.piece.end - p.piece.start, 0);
    positions.push(lo);
    pieces.forEach((p, i) => {
      const len = p.piece.end - p.piece.start;
      // Half-way shares round up, with room for the rounding in positions that sum lengths.
      const n = Math.max(1, Math.floor((opts.elements * len) / total + 0.5 + 1e-9));
      for (let j = 0; j < n; j++) {
        const a = p.piece.start + (len * j) / n;
        const b = j === n - 1 ? p.piece.end : p.piece.start + (len * (j + 1)) / n;
        const seg = p.piece.segment;
        // A coupling's spring goes in series on the middle element of its piece.
        const kc = j === Math.floor((n - 1) / 2) ? seg.coupling?.stiffness : undefined;
        const springs: ChainSpring[] = [{ kind: 'shaft', segment: seg, compliance: compliance(b - a, G(p.piece), seg.diameter, seg.bore) }];
        if (kc) springs.push({ kind: 'coupling', segment: seg, compliance: 1 / kc });
        const C = springs.reduce((s, x) => s + x.compliance, 0);
        elements.push({
          start: a,
          end: b,
          stiffness: 1 / C,
          inertia: shaftInertia(rho(seg), b - a, seg.diameter, seg.bore),
          pieces: [i],
          side: p.side,
          springs,
          ...(kc ? { coupling: seg } : {}),
        });
        positions.push(b);
      }
    });
  } else {
    const at = [...new Set([stop.at, ...loaded.map((s) => s.at)])].sort((x, y) => x - y);
    positions.push(...at);
    for (let k = 0; k + 1 < at.length; k++) {
      const inRun = pieces.flatMap((p, i) => (p.piece.start >= at[k] - EPS && p.piece.end <= at[k + 1] + EPS ? [i] : []));
      const springs: ChainSpring[] = inRun.flatMap((i) => {
        const p = pieces[i].piece;
        const kc = p.segment.coupling?.stiffness;
        const shaft: ChainSpring = { kind: 'shaft', segment: p.segment, compliance: compliance(p.end - p.start, G(p), p.segment.diameter, p.segment.bore) };
        return kc ? [shaft, { kind: 'coupling' as const, segment: p.segment, compliance: 1 / kc }] : [shaft];
      });
      const C = springs.reduce((s, x) => s + x.compliance, 0);
      const coupled = inRun.map((i) => pieces[i].piece.segment).find((g) => g.coupling?.stiffness);
      elements.push({ start: at[k], end: at[k + 1], stiffness: 1 / C, inertia: 0, pieces: inRun, side: sideOf(0.5 * (at[k] + at[k + 1])), springs, ...(coupled ? { coupling: coupled } : {}) });
    }
  }
  placeDevices(elements, pieces);

  const nodes: ChainNode[] = positions.map((at) => ({ at, inertia: 0, stations: [], side: Math.abs(at - stop.at) <= EPS ? 'stop' : sideOf(at) }));
  const stopNode = nodes.findIndex((n) => n.side === 'stop');
  const nodeAt = (x: number) => nodes.reduce((best, n, i) => (Math.abs(n.at - x) < Math.abs(nodes[best].at - x) ? i : best), 0);
  const drives: ChainDrive[] = [];
  const holds: ChainHold[] = [];
  for (const s of c.stations) {
    if (s.at < lo - EPS || s.at > hi + EPS) continue;
    const i = Math.abs(s.at - stop.at) <= EPS ? stopNode : nodeAt(s.at);
    if (!opts.shaftInertia && s.parts.length === 0 && i !== stopNode) continue;
    nodes[i].stations.push(s.name);
    nodes[i].inertia += stationInertia(s);
    if (s.drive) drives.push(chainDrive(s, i, c.speed));
    if (i !== stopNode && Math.abs(nodes[i].at - s.at) <= EPS) {
      if (s.backstop) holds.push({ node: i, station: s.name, kind: 'backstop' });
      else if (s.gearbox && !s.gearbox.backDrivable) holds.push({ node: i, station: s.name, kind: 'self-locking gearbox' });
    }
  }
  if (opts.shaftInertia) {
    elements.forEach((el, e) => {
      nodes[e].inertia += el.inertia / 2;
      nodes[e + 1].inertia += el.inertia / 2;
    });
    for (const seg of c.shaft.segments) {
      const left = Math.min(seg.end, lo) - seg.start;
      const right = seg.end - Math.max(seg.start, hi);
      if (left > EPS) nodes[0].inertia += shaftInertia(rho(seg), left, seg.diameter, seg.bore);
      if (right > EPS) nodes[nodes.length - 1].inertia += shaftInertia(rho(seg), right, seg.diameter, seg.bore);
    }
  }
  placeFits(c, nodes, elements, stopNode);
  placeBacklash(elements, pieces);
  return { nodes, elements, pieces, stopNode, drives, holds, shaftInertia: opts.shaftInertia };
}

/** A segment's backlash goes on the middle one of its elements on each side (as a limiter does). */
function placeBacklash(elements: ChainElement[], pieces: ChainPiece[]): void {
  const groups = new Map<string, number[]>();
  elements.forEach((el, e) => {
    for (const i of el.pieces) {
      const seg = pieces[i].piece.segment;
      if (seg.backlash === undefined) continue;
      const key = `${seg.index}:${el.side}`;
      const list = groups.get(key) ?? [];
      if (!list.includes(e)) list.push(e);
      groups.set(key, list);
    }
  });
  for (const list of groups.values()) {
    const el = elements[list[Math.floor((list.length - 1) / 2)]];
    const seg = el.pieces.map((i) => pieces[i].piece.segment).find((s) => s.backlash !== undefined)!;
    el.backlash = { gap: seg.backlash!, segment: seg };
  }
}

/**
 * A shrink or press fit at the chain's end on either side (the farthest loaded station) slips like
 * a limiter on the element next to that end node: all the torque that element carries passes
 * through the hub (less the shaft's own inertia lumped on the end node, a small share). A fit at a
 * station inside the chain carries only its own parts' torque, which no one element holds, so the
 * dynamic model leaves it rigid and the fit is checked against the torque through it afterwards
 * (src/results/hub-fits.ts). A fit at the stop is the jam's own slip (see `stopOf` in
 * src/results/dynamic-solve.ts).
 */
function placeFits(c: Case, nodes: ChainNode[], elements: ChainElement[], stopNode: number): void {
  const ends = [0, nodes.length - 1].filter((i) => i !== stopNode);
  for (const i of ends) {
    const e = i === 0 ? 0 : elements.length - 1;
    if (e < 0 || e >= elements.length) continue;
    for (const name of nodes[i].stations) {
      const s = c.stations.find((x) => x.name === name)!;
      if (!s.fit) continue;
      const cap = fitCapacity(c, s);
      const el = elements[e];
      if (!el.device || cap.slipTorque < el.device.torque) el.device = { kind: 'hub fit', torque: cap.slipTorque, segment: cap.seat, station: s.name };
    }
  }
}

/** Parts at a station at shaft speed, less a belt drive's rotor (which sits behind its belt). */
export function stationInertia(s: Station): number {
  const behindBelt = s.drive?.belt ? new Set(s.drive.rotorParts) : new Set<number>();
  return s.parts.reduce((sum, p, i) => (behindBelt.has(i) ? sum : sum + reflectedInertia(p.inertia, p.speedRatio) * p.count), 0);
}

/**
 * A segment's limiter or shear pin goes on one element: the middle one of the segment's elements
 * on each side of the stop (the segment's own inertia is small, so where in it hardly matters).
 */
function placeDevices(elements: ChainElement[], pieces: ChainPiece[]): void {
  const groups = new Map<string, number[]>();
  elements.forEach((el, e) => {
    for (const i of el.pieces) {
      const seg = pieces[i].piece.segment;
      if (seg.slipTorque === undefined && seg.shearTorque === undefined) continue;
      const key = `${seg.index}:${el.side}`;
      const list = groups.get(key) ?? [];
      if (!list.includes(e)) list.push(e);
      groups.set(key, list);
    }
  });
  for (const list of groups.values()) {
    const el = elements[list[Math.floor((list.length - 1) / 2)]];
    const seg = el.pieces.map((i) => pieces[i].piece.segment).find((s) => s.slipTorque !== undefined || s.shearTorque !== undefined)!;
    const device = seg.slipTorque !== undefined ? { kind: 'torque limiter' as const, torque: seg.slipTorque, segment: seg } : { kind: 'shear pin' as const, torque: seg.shearTorque!, segment: seg };
    if (!el.device || device.torque < el.device.torque) el.device = device;
  }
}
