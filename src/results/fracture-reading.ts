import type { Case, FractureObservation, FractureType } from '../case/case.ts';
import type { SideName } from '../model/shaft-model.ts';
import type { PlasticPieceResult, PlasticResult, PlasticVerdict } from './plastic-result.ts';

/** The published source for what each fracture surface usually means. */
export const FRACTOGRAPHY_SOURCE =
  'ASM Handbook Vol. 11, Failure Analysis and Prevention (ASM International, 2002), "Failures of Shafts"; Beer & Johnston, Mechanics of Materials, Ch. 3, ductile and brittle specimens in torsion (from memory, verify the sections)';

export const FRACTOGRAPHY_CAUTION =
  'These are the usual meanings of a fracture surface, not a diagnosis: reading one needs a qualified failure examiner with the parts in hand. Keep the broken pieces as found, uncleaned and with the mating faces apart, for the examiner.';

/** agrees / disagrees with the predicted verdict; not_comparable: the observation cannot test it. */
export type FractureAgreement = 'agrees' | 'disagrees' | 'not_comparable';

export interface FractureFinding {
  observation: FractureObservation;
  /** What this kind of surface usually means. */
  meaning: string;
  agreement: FractureAgreement;
  /** How the observation compares with the predicted verdict, in plain words. */
  comparison: string;
  /** Where the model expects the first break, if it can break: side and piece. */
  predictedAt: { side: string; piece: PlasticPieceResult } | undefined;
  source: string;
  caution: string;
}

const MEANINGS: Record<FractureType, string> = {
  none: 'The shaft did not break.',
  transverse:
    'A flat fracture straight across the shaft (the transverse plane, where shear is greatest), often with circumferential smear marks and little change of diameter, is the usual sign of a ductile shear overload in torsion.',
  helical:
    'A fracture on a 45° helix lies across the greatest tensile stress: the usual sign of a brittle fracture in torsion, or of one governed by tension (embrittled or through-hardened material, low temperature, or bending or tension added to the torque).',
  fatigue:
    'Beach marks (progression lines) or ratchet marks mean a fatigue crack grew before the final event, from one or more origins; the smaller the final zone, the lower the load that finished it. The jam may only have finished a crack, so an overload calculation for an intact shaft overstates what this shaft could take.',
  unknown: 'The surface type is not recorded; have the fracture surface examined before drawing conclusions.',
};

/** What a model predicts about fracture, for the comparison with what was found. */
export interface FracturePrediction {
  verdict: PlasticVerdict;
  /** The piece predicted to break first, in the energy balance's terms. */
  predictedAt?: { side: SideName; piece: PlasticPieceResult };
}

/** The energy balance's fracture prediction: the first piece to break on the first side that breaks. */
export function balanceFracturePrediction(plastic: PlasticResult): FracturePrediction {
  const side = plastic.sides.find((s) => s.firstToBreak !== undefined && s.verdict === 'fracture predicted');
  return { verdict: plastic.verdict, ...(side ? { predictedAt: { side: side.side, piece: side.pieces[side.firstToBreak!] } } : {}) };
}

/** Compares the recorded fracture (if any) with the predicted verdict and says what the surface usually means. */
export function readFracture(c: Case, prediction: FracturePrediction): FractureFinding | undefined {
  const obs = c.observed.fracture;
  if (!obs) return undefined;
  const plastic = prediction;
  const predictedAt = prediction.predictedAt;
  const predicted = plastic.verdict === 'fracture predicted';
  const brittleBreak = predictedAt?.piece.brittle ?? false;
  let agreement: FractureAgreement;
  let comparison: string;
  switch (obs.type) {
    case 'none':
      agreement = predicted ? 'disagrees' : 'agrees';
      comparison = predicted
        ? 'The model predicts fracture but the shaft did not break: the estimate is cautious (published minimum strengths, a rough fracture strain) or energy was taken elsewhere before it reached the shaft.'
        : 'No fracture is predicted, and none was found.';
      break;
    case 'transverse':
      agreement = predicted && !brittleBreak ? 'agrees' : 'disagrees';
      comparison = !predicted
        ? 'The shaft broke but the model predicts no fracture at the recorded speed: more energy reached it than the recorded speed explains, the material was weaker or less ductile than assumed, or an existing crack reduced the section (look for beach marks).'
        : brittleBreak
          ? 'Fracture is predicted, but in brittle material, which usually breaks on a 45° helix rather than flat across: check the material and where it broke.'
          : 'Fracture is predicted in ductile material, which agrees with a flat shear overload.';
      break;
    case 'helical':
      agreement = predicted && brittleBreak ? 'agrees' : 'disagrees';
      comparison =
        predicted && brittleBreak
          ? 'Fracture is predicted in brittle material, which agrees with a 45° helical surface.'
          : `A ductile shaft in torsional overload usually breaks flat across${predicted ? '' : ', and no fracture is predicted'}; a helix points to embrittlement, a hardened case or core, low temperature, or bending or tension with the torque. Have the material checked.`;
      break;
    case 'fatigue':
      agreement = 'not_comparable';
      comparison = `The overload verdict (${plastic.verdict}) is for an intact shaft; a fatigue crack before the event means the shaft broke at less than that, so the verdict cannot be tested against this fracture. Look for the source of the cyclic load (misalignment, torsional vibration, start-stop duty) and at the stress raisers, where kt matters.`;
      break;
    default:
      agreement = 'not_comparable';
      comparison = `The predicted verdict is ${plastic.verdict}; without the surface type it cannot be compared.`;
  }
  return { observation: obs, meaning: MEANINGS[obs.type], agreement, comparison, predictedAt, source: FRACTOGRAPHY_SOURCE, caution: FRACTOGRAPHY_CAUTION };
}
