import { SCHEMA_VERSION } from './schema-version.ts';

/**
 * The JSON Schema (draft 2020-12) of `check --json` and of a report's results.json (the same object
 * with `resize`, `inputs` and the run's record added). The top level and the finding are closed (a
 * key the schema does not name is an error, so a new key cannot go in undescribed); the detailed
 * objects beneath name their main keys and leave room for more. A test validates the JSON of every
 * sample case against it. Keys carry their SI unit (`_Pa`, `_Nm`, `_rad`, `_m`, `_s`, `_J`, `_Hz`).
 */

type Json = Record<string, unknown>;

const num = (description: string): Json => ({ type: 'number', description });
const str = (description: string): Json => ({ type: 'string', description });
const orNull = (s: Json): Json => ({ anyOf: [s, { type: 'null' }], description: s.description });
const open = (description: string, properties: Record<string, Json> = {}): Json => ({ type: 'object', description, properties });
const list = (description: string, items: Json = {}): Json => ({ type: 'array', description, items });
/** A pair whose places mean something, each place described. */
const pair = (description: string, first: string, second: string, item: Json = { type: 'number' }): Json => ({
  type: 'array',
  description,
  prefixItems: [
    { ...item, description: first },
    { ...item, description: second },
  ],
  minItems: 2,
  maxItems: 2,
});
const percentiles = (description: string): Json => ({
  type: 'object',
  description,
  properties: { p5: num('5th percentile'), p50: num('median'), p95: num('95th percentile') },
  required: ['p5', 'p50', 'p95'],
  additionalProperties: false,
});
const swingEnd = (description: string): Json => ({
  type: 'object',
  description,
  properties: {
    value: num("The input's value at this end, SI (the unit of the input's kind)."),
    yield_ratio: num('Stress / shear yield with the input there.'),
    permanent_twist_rad: num('Permanent twist with the input there.'),
  },
  required: ['value', 'yield_ratio'],
  additionalProperties: false,
});
const piece = open('A piece of the shaft between two positions from its start.', { from_m: num('Start, m.'), to_m: num('End, m.') });

const FINDING: Json = {
  type: 'object',
  description: 'The one finding every view shows: the verdict, its model and that model’s numbers for the governing piece. Read it first.',
  properties: {
    verdict: str('The verdict (ELASTIC, YIELDED, FRACTURE …).'),
    basis: { type: 'string', enum: ['energy method', 'dynamic model'], description: 'The model the verdict stands on.' },
    basis_reason: str('Why that model.'),
    past_yield_model: str('The model that follows the shaft past yield.'),
    side: str('The side of the stop the governing piece is on.'),
    segment: open('The governing piece: segment index, label, position, diameter, bore, kt.', {
      index: { type: 'integer' },
      label: orNull(str('The segment’s label.')),
      from_m: num('Start, m.'),
      to_m: num('End, m.'),
      diameter_m: num('Diameter, m.'),
      bore_m: num('Bore, m.'),
      kt: num('Stress-concentration factor.'),
    }),
    peak_torque_Nm: num('The peak torque it carried (capped past yield), N·m.'),
    elastic_peak_torque_Nm: num('The peak torque an elastic shaft would carry, N·m.'),
    elastic_shear_stress_Pa: num('The elastic shear stress with kt applied, Pa.'),
    shear_yield_Pa: num('The shear yield strength (shear strength for brittle material), Pa.'),
    yield_ratio: num('Stress / shear yield: the elastic stress over shear yield.'),
    brittle: { type: 'boolean', description: 'Whether the material is treated as brittle.' },
    permanent_twist_rad: orNull(num('The permanent twist predicted on the side, rad.')),
    break_time_s: orNull(num('When the piece broke in the dynamic model, s from the stop.')),
    yield_probability: orNull(num('The chance of yield under the case’s tolerances, 0 to 1.')),
    yield_probability_interval: orNull(pair('The 95 % interval of the chance.', 'low end', 'high end')),
    probability_method: orNull(str('How the chance was obtained.')),
    measured_twist: list(
      'Each measured permanent twist against the model.',
      open('One measurement.', {
        between: pair('The two stations.', 'first station', 'second station', { type: 'string' }),
        measured_rad: num('Measured, rad.'),
        predicted_rad: orNull(num('Predicted, rad.')),
        finding: str('How they compare.'),
        speed_for_measured_rad_s: orNull(num('The speed that would explain the measurement, rad/s.')),
      }),
    ),
    disposition: str('What to do with the shaft.'),
    action: { type: 'string', enum: ['return to service', 'inspect before return', 'replace'], description: 'The disposition in three words: the decision the person who signs makes.' },
    sentence: str('The finding in words, in the case’s units.'),
  },
  additionalProperties: false,
};

const UNCERTAINTY: Json = open('The uncertainty run (where the case states tolerances).', {
  samples: { type: 'integer', description: 'Samples through the energy method.' },
  seed: { type: 'integer', description: 'The random seed.' },
  strength_scatter: num('The coefficient of variation of strengths.'),
  yield_probability: num('The energy method’s chance of yield.'),
  percentiles: {
    type: 'object',
    description: 'Percentiles over the samples (the energy method).',
    properties: {
      yield_ratio: percentiles('Stress / shear yield.'),
      max_shear_stress_Pa: percentiles('Peak shear stress, Pa.'),
      peak_torque_Nm: percentiles('Peak torque, N·m.'),
      permanent_twist_rad: orNull(percentiles('Permanent twist, rad.')),
    },
    required: ['yield_ratio', 'max_shear_stress_Pa', 'peak_torque_Nm'],
    additionalProperties: false,
  },
  sensitivity: list('Each input swung across its band, largest swing first.', {
    type: 'object',
    properties: { input: str('The input’s field path.'), low: swingEnd('The input at mean − 2σ.'), high: swingEnd('The input at mean + 2σ.') },
    required: ['input', 'low', 'high'],
    additionalProperties: false,
  }),
  dynamic: open('The runs through the dynamic model, where the finding stands on it.', {
    samples: { type: 'integer' },
    yield_probability: num('The dynamic model’s chance of yield.'),
    percentiles: open('Percentiles over the dynamic runs.', {
      yield_ratio: percentiles('Stress / shear yield.'),
      peak_torque_Nm: percentiles('Peak torque, N·m.'),
      max_shear_stress_Pa: percentiles('Peak shear stress, Pa.'),
    }),
  }),
});

/** The keys of `check --json`, in its order. */
const CHECK: Record<string, Json> = {
  schema_version: { const: SCHEMA_VERSION, description: 'The version of this JSON; raised when a key is renamed or removed or its meaning changes.' },
  case_id: str('The case’s id.'),
  speed_rad_s: num('The speed at the stop, rad/s.'),
  kinetic_energy_J: num('The kinetic energy at the stop, J.'),
  max_shear_stress_Pa: num('The energy method’s peak shear stress, Pa.'),
  shear_yield_Pa: num('Shear yield at the energy method’s governing piece, Pa.'),
  yield_ratio: num('The energy method’s stress / shear yield.'),
  verdict: str('The verdict (as finding.verdict).'),
  verdict_basis: str('The verdict’s model (as finding.basis).'),
  verdict_yield_ratio: num('Stress / shear yield by the verdict’s model.'),
  verdict_reason: str('Why that model.'),
  past_yield_basis: str('The model past yield.'),
  governing: { ...piece, description: 'The energy method’s governing piece.', properties: { side: str('Its side.'), from_m: num('Start, m.'), to_m: num('End, m.') } },
  warnings: list('Warnings about the model.', { type: 'string' }),
  input_warnings: list(
    'Inputs that look implausible, with their position in the case file.',
    open('One warning.', {
      code: str('Its code.'),
      path: str('The field path.'),
      line: { type: ['integer', 'null'] },
      column: { type: ['integer', 'null'] },
      message: str('What looks wrong.'),
      fix: str('What it may have been meant as.'),
    }),
  ),
  cautions: list('The cautions that go with every verdict.', { type: 'string' }),
  sides: list('The energy method, side by side of the stop.', open('One side.')),
  elastic_verdict: str('The elastic energy method’s verdict, for comparison.'),
  plastic: open('The energy balance past yield.'),
  observed: list('Each observation read back to the incident.', open('One observation.')),
  observed_fracture: orNull(open('The observed fracture against the model.')),
  uncertainty: UNCERTAINTY,
  dynamic: open('The dynamic model: maxima, per segment, what slipped, events.', {
    natural_frequencies_Hz: list('Natural frequencies, Hz.', { type: 'number' }),
    peak_torque_Nm: num('Peak torque, N·m.'),
    duration_s: num('The simulated window, s.'),
    elements: { type: 'integer', description: 'Shaft elements.' },
    damping: open('Which damper took the energy the model dissipated over the window, and whether it still rings at the end.', {
      dissipated_J: num('Energy all the dampers dissipated over the window, J.'),
      dampers: list(
        'Each damper, the largest energy first.',
        open('One damper.', {
          kind: { type: 'string', enum: ['coupling', 'shaft'], description: "A coupling's damping, or the shaft's material damping." },
          segment: orNull({
            type: 'integer',
            description: "The segment (index from 0): a coupling's, or a shaft segment with its own damping_ratio; null: the shaft's material damping of every other segment.",
          }),
          damping_ratio: num('Its damping ratio, fraction of critical.'),
          energy_J: num('Energy it dissipated over the window, J.'),
          share: num('Its share of what all the dampers dissipated.'),
        }),
      ),
      ringing: orNull(
        open("The most loaded piece's torque: half-swing over the first lowest period after its peak and over the window's last period.", {
          first_cycle_Nm: num('Half-swing over the first period after the peak, N·m.'),
          last_cycle_Nm: num("Half-swing over the window's last period, N·m."),
          ratio: num('Last over first.'),
          rings_on: { type: 'boolean', description: 'It still rings at about constant amplitude at the end of the window (the ratio at least 0.7).' },
        }),
      ),
    }),
  }),
  keys: list(
    "Each station's key at the torque it carried: shear and bearing against its strengths, the torque that shears it.",
    open('One key.', {
      station: str('Its station.'),
      torque_Nm: num('The torque through it, N·m.'),
      shear_ratio: num('Shear stress over the shear strength it is judged by.'),
      shear_off_torque_Nm: num('The torque that shears it off, N·m.'),
    }),
  ),
  fits: list(
    'Each shrink or press fit: contact pressure (Lamé), the torque that slips it, whether it slipped.',
    open('One fit.', { station: str('Its station.'), contact_pressure_Pa: num('Contact pressure, Pa.'), slip_torque_Nm: num('The torque that slips it, N·m.'), slipped: { type: 'boolean' } }),
  ),
  couplings: list(
    'Each coupling against its rating.',
    open('One coupling.', { segment: { type: 'integer' }, rated_torque_Nm: num('Rated torque, N·m.'), torque_Nm: num('The torque it carried, N·m.') }),
  ),
  gearboxes: list(
    "Each station's gearbox: the torque at its output and input at the incident peak against its rated output torque × service factor.",
    open('One gearbox.', {
      station: str('Its station.'),
      ratio: num('Input speed over output speed.'),
      capacity_Nm: num('Rated output torque × service factor, N·m.'),
      output_torque_Nm: num('The torque at its output, N·m.'),
      input_torque_Nm: num('The torque at its input, output ÷ (ratio × efficiency), N·m.'),
      rating_ratio: num('Output torque over capacity.'),
      held_torque_Nm: orNull(num('Self-locking: the largest torque it held against back-driving, N·m.')),
      tooth_bending_stress_Pa: orNull(num("The output gear's tooth bending stress by the Lewis equation, Pa: a first estimate.")),
    }),
  ),
  backstops: list(
    "Each station's backstop: the rebound torque it held.",
    open('One backstop.', {
      station: str('Its station.'),
      rebound_torque_Nm: num('The largest torque it held against turning backwards, N·m.'),
      rated_torque_Nm: orNull(num('Its rated torque, N·m.')),
      in_dynamic_model: { type: 'boolean' },
    }),
  ),
  drive_train: list('Every element of the drive train in the order it would give way (the finding orders them).', {
    type: 'object',
    properties: {
      element: str('The element.'),
      kind: str('Its kind (shaft, key, fit, coupling, gearbox, backstop, torque limiter, shear pin).'),
      station_or_segment: str('Where it sits.'),
      capacity_Nm: orNull(num('The torque at which it gives way, N·m at shaft speed.')),
      gives_way_by: str('How it gives way.'),
      torque_Nm: num('The torque it carried in the incident, N·m at shaft speed.'),
      ratio: num('Torque over capacity.'),
      order: { type: 'integer', description: '1 for the first to give way.' },
    },
    required: ['element', 'kind', 'station_or_segment', 'capacity_Nm', 'torque_Nm', 'ratio', 'order'],
    additionalProperties: false,
  }),
  asset: orNull(str("The machine's asset tag (case.asset).")),
  materials_catalogue: orNull(open("The site's materials catalogue the case read: its file and SHA-256.", { file: str('Its file.'), sha256: str('Its SHA-256.') })),
  fatigue: open('The fatigue of this jam at the governing stress raiser: its cycles, life and damage (Miner fraction).'),
  asset_history: open("This incident's place in its asset's history (where the log finds the other incidents)."),
  finding: FINDING,
};

/** The keys a report's results.json adds. */
const REPORT: Record<string, Json> = {
  resize: open('What goes back in: the options `resize --json` prints.'),
  inputs: open('The inputs as parsed, SI.'),
  tool_version: str('The version of shaftcase that wrote it.'),
  ran_at: { type: 'string', pattern: String.raw`^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}[+-]\d{2}:\d{2}$`, description: 'When it ran, ISO 8601 with the UTC offset.' },
  case_file: str('The case file’s name.'),
  case_sha256: { type: 'string', pattern: '^[0-9a-f]{64}$', description: 'The SHA-256 of the case file as read.' },
};

/** The JSON Schema of `check --json` and results.json. */
export function resultsJsonSchema(): Json {
  const required = Object.keys(CHECK).filter((k) => k !== 'uncertainty' && k !== 'asset_history');
  return {
    $schema: 'https://json-schema.org/draft/2020-12/schema',
    title: 'shaftcase results (check --json, results.json)',
    description: 'The results of one case, SI, keys carrying their units. `finding` is the one verdict; the report’s results.json adds resize, inputs and the run’s record.',
    type: 'object',
    properties: { ...CHECK, ...REPORT },
    required,
    additionalProperties: false,
  };
}
