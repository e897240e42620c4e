import type { TorqueSpeedLine } from '../motor-torque.ts';
import type { TorqueLaw } from '../torque-law.ts';

/**
 * The torsional chain as the integrator takes it: numbers only, SI, everything at shaft speed.
 * Nodes run in order along the shaft; element e joins node e to node e + 1. Angles and speeds are
 * positive in the running sense; an element's twist is φ[e+1] − φ[e].
 */
export interface ChainSystem {
  /** Node inertias, kg·m² (parts reflected through their speed ratios, shaft inertia lumped; a rotor behind a belt is not here). */
  inertia: Float64Array;
  /** One torque law per element. */
  laws: TorqueLaw[];
  /** Dashpot per element at its elastic stiffness, N·m·s/rad (stiffness-proportional damping; used where the law says it acts, scaled by the law's tangent over its elastic stiffness). */
  damping: Float64Array;
  /**
   * Each element's own inertia, kg·m², already lumped half on each end node; with it the torque at
   * an element's end faces is T ∓ ½j·a (see `ChainRecorder`). Absent: 0 (massless springs).
   */
  elementInertia?: Float64Array;
  /** Initial twist per element, rad (the running torque's twist; 0 without a drive). */
  initialTwist: Float64Array;
  /** Speed of the whole shaft just before the stop, rad/s. */
  speed: number;
  /** The node that stops, and how. */
  stop: SystemStop;
  drives: SystemDrive[];
  /**
   * Nodes that cannot turn backwards (a backstop, a self-locking gearbox): each is free while it
   * turns forward, and held at standstill once its speed would go below zero, until the torques on
   * it push it forward again. Absent: none.
   */
  holds?: readonly number[];
}

export interface SystemStop {
  node: number;
  /** Time for its speed to fall linearly to zero, s; 0: at once. */
  duration: number;
  /** The most torque the jam holds, N·m; undefined: any torque (the stop node's motion is prescribed). */
  torqueCapacity?: number;
}

export interface SystemDrive {
  /** The node the drive turns (its pulley's or coupling's node). */
  node: number;
  /** Motor torque against speed, both at the shaft (already reflected through the speed ratio). */
  line: TorqueSpeedLine;
  /** Rotor inertia at shaft speed behind the belt, kg·m²; used only with a belt (without one the rotor is in the node). */
  rotorInertia: number;
  /** Belt slip torque at the shaft, N·m; undefined: no belt (the rotor is rigidly part of the node). */
  beltSlipTorque?: number;
  /** Time from the stop's start at which the drive's protection cuts the motor's torque, s; undefined: never. */
  tripAfter?: number;
}
