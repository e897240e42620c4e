import type { OptionId, ResizeResult } from '../resize/resize-result.ts';
import { sideOf, sideYieldRatio } from '../resize/side-ratio.ts';
import type { StiffnessChange } from '../resize/stiffness-change.ts';
import { show, sig } from './display-units.ts';
import { combinedName, runningWords, segName } from './resize-words.ts';
import { showDiameter } from './show-diameter.ts';

/** One option as a row of the options table; every cell is text. */
export interface OptionRow {
  option: string;
  change: string;
  /** Repeat-incident stress / shear yield, from the rerun. */
  yieldRatio: string;
  peakTorque: string;
  running: string;
  /** New over present torsional stiffness and natural frequency. */
  stiffness: string;
}

export const ROW_HEADINGS: Record<keyof OptionRow, string> = {
  option: 'Option',
  change: 'New size or setting',
  yieldRatio: 'Repeat stress / shear yield',
  peakTorque: 'Repeat peak torque',
  running: 'Running factor kt (static)',
  stiffness: 'Stiffness, freq.',
};

const times = (x: number) => `×${sig(x)}`;
const changeCells = (c: StiffnessChange | undefined) => ({ stiffness: c ? `k ${times(c.stiffness)}, f ${times(c.frequency)}` : '—' });

/** "Ø 60, 75 mm": the diameters in a row, the unit once where it is millimetres. */
function diameters(ds: readonly number[], u: ResizeResult['results']['case']['units']): string {
  const shown = ds.map((d) => showDiameter(d, u));
  return `Ø ${u === 'metric' ? `${shown.map((t) => t.replace(' mm', '')).join(', ')} mm` : shown.join(', ')}`;
}

/** The options side by side, the present shaft first, the pick marked "(recommended)" and a flagged option "(flagged)". Numbers from the ResizeResult only. */
export function optionRows(z: ResizeResult): OptionRow[] {
  const mark = (id: OptionId, flags: readonly string[]) => (z.recommended?.option === id ? ' (recommended)' : flags.length > 0 ? ' (flagged)' : '');
  const r = z.results;
  const u = r.case.units;
  const side = r.governing.side.side;
  const rows: OptionRow[] = [];
  rows.push({
    option: `Present shaft${z.recommended?.option === 'present' ? ' (recommended)' : ''}`,
    change: 'as it is',
    yieldRatio: sig(r.yieldRatio),
    peakTorque: show(r.governing.side.peakTorque, 'torque', u),
    running: runningWords(z.present.running, u),
    stiffness: '—',
  });

  const s = z.scaleSide;
  rows.push({
    option: `Scale side ${s.side} ×${sig(s.s)}${mark('scale_side', s.flags)}`,
    change: `${diameters(s.stockDiameters, u)}${s.practical ? '' : ' (not practical)'}`,
    yieldRatio: sig(sideYieldRatio(s.stockRerun, s.side)),
    peakTorque: show(sideOf(s.stockRerun, s.side).peakTorque, 'torque', u),
    running: runningWords(s.running, u),
    ...changeCells(s.change),
  });

  const k = z.criticalSegment;
  const seg = segName(k.segment);
  rows.push(
    k.stockRerun
      ? {
          option: `Resize ${seg} only${mark('critical_segment', k.flags)}`,
          change: `Ø${showDiameter(k.segment.diameter, u)} → ${showDiameter(k.stockDiameter!, u)}`,
          yieldRatio: sig(sideYieldRatio(k.stockRerun, side)),
          peakTorque: show(sideOf(k.stockRerun, side).peakTorque, 'torque', u),
          running: runningWords(k.running!, u),
          ...changeCells(k.change),
        }
      : { option: `Resize ${seg} only${mark('critical_segment', k.flags)}`, change: 'no size works: the others become critical', yieldRatio: '—', peakTorque: '—', running: '—', stiffness: '—' },
  );

  // The material shown: the picked one, else the best that has no flag, else the best that keeps N, else the best.
  const m =
    z.materials.find((x) => z.recommended?.option === `material:${x.material.key}`) ?? z.materials.find((x) => x.flags.length === 0) ?? z.materials.find((x) => x.keepsFactor) ?? z.materials[0];
  if (m) {
    rows.push({
      option: `Material ${m.material.key}${mark(`material:${m.material.key}`, m.flags)}`,
      change: m.keepsFactor ? 'same geometry' : 'same geometry (best; none keeps N)',
      yieldRatio: sig(m.yieldRatio),
      peakTorque: show(sideOf(m.rerun, side).peakTorque, 'torque', u),
      running: runningWords(m.running, u),
      ...changeCells(m.change),
    });
  }

  const l = z.limiter;
  const window =
    l.min === undefined
      ? `set ≤ ${show(l.max, 'torque', u)} (lower end unknown)`
      : l.windowEmpty
        ? `NONE: window empty (${show(l.min, 'torque', u)} > ${show(l.max, 'torque', u)})`
        : `set ${show(l.min, 'torque', u)} to ${show(l.max, 'torque', u)}`;
  rows.push({
    option: `Torque limiter at "${l.station}"${mark('limiter', l.flags)}`,
    change: window,
    yieldRatio: sig(l.yieldRatio),
    peakTorque: show(l.slip.peakTorque, 'torque', u),
    running: runningWords(l.running, u),
    stiffness: 'unchanged',
  });

  for (const o of z.combined) {
    const settings = o.limiters.map((x) => `set ${show(x.setting, 'torque', u)}`).join(', ');
    const shaft =
      o.option === 'limiter_setting'
        ? 'present shaft'
        : o.option === 'limiter_material'
          ? o.material!.key
          : o.segments.map((g) => `${segName(g.segment)} Ø${showDiameter(g.segment.diameter, u)} → ${showDiameter(g.stockDiameter, u)}`).join(', ');
    rows.push({
      option: `${combinedName(o)}${mark(o.option, o.flags)}`,
      change: `${settings}; ${shaft}`,
      yieldRatio: sig(o.yieldRatio),
      peakTorque: show(Math.max(...o.limiters.map((x) => x.slip.peakTorque)), 'torque', u),
      running: runningWords(o.running, u),
      stiffness: o.option === 'limiter_setting' ? 'unchanged' : '—',
    });
  }

  for (const key of z.keys) {
    rows.push({
      option: `Key as fuse at "${key.station}" (flagged)`,
      change: key.shearsBeforeShaftYields ? 'shears before the shaft yields' : 'does not shear before the shaft yields',
      yieldRatio: `key: shear ${sig(key.incident.shearRatio)}, bearing ${sig(key.incident.bearingRatio)}`,
      peakTorque: show(key.incident.torque, 'torque', u),
      running: key.atRunning ? `key ${sig(key.atRunning.factor)}` : '—',
      stiffness: 'unchanged',
    });
  }
  return rows;
}
