// Mass moments of inertia of the parts a case describes. Beer & Johnston, Vector Mechanics for
// Engineers: Dynamics, table of mass moments of inertia of common shapes (from memory, confident).

/** Solid or bored disc (or cylinder) about its axis: J = (π/32)·ρ·t·(D⁴ − d⁴), kg·m². */
export function discInertia(density: number, thickness: number, diameter: number, bore = 0): number {
  return (Math.PI / 32) * density * thickness * (diameter ** 4 - bore ** 4);
}

/** A mass with its radius of gyration: J = m·k², kg·m². */
export function massInertia(mass: number, radiusOfGyration: number): number {
  return mass * radiusOfGyration ** 2;
}

/**
 * Inertia felt at shaft speed of a part turning `speedRatio` times as fast (belt or gears):
 * kinetic energy ½·J·(rω)² equals ½·(J·r²)·ω² (Den Hartog, Mechanical Vibrations, geared systems;
 * from memory, confident).
 */
export function reflectedInertia(inertia: number, speedRatio: number): number {
  return inertia * speedRatio ** 2;
}

/** Kinetic energy of a rotating inertia, J: ½·J·ω². */
export function kineticEnergy(inertia: number, speed: number): number {
  return 0.5 * inertia * speed ** 2;
}

/**
 * A part's own inertia from its shape's dimensions (SI), as the case file gives them: a disc from
 * diameter, thickness, bore and density; a mass from mass and radius of gyration; an inertia as given.
 */
export function partInertia(shape: 'disc' | 'inertia' | 'mass', dims: Readonly<Record<string, number>>): number {
  if (shape === 'disc') return discInertia(dims.density, dims.thickness, dims.diameter, dims.bore ?? 0);
  if (shape === 'mass') return massInertia(dims.mass, dims.radius_of_gyration);
  return dims.inertia;
}
