import type { Material } from '../materials/material.ts';
import { sig } from './display-units.ts';
import { textTable } from './text-table.ts';

/** The material library as a text table: key, name, G, Sy, Sut, density, basis; sources below. */
export function renderMaterials(list: readonly Material[]): string {
  const mpa = (v?: number) => (v === undefined ? '—' : sig(v / 1e6));
  const rows = [
    ['key', 'material', 'G GPa', 'Sy MPa', 'Sut MPa', 'kg/m³', 'basis'],
    ...list.map((m) => [
      m.key,
      m.name,
      m.shearModulus === undefined ? '—' : sig(m.shearModulus / 1e9),
      mpa(m.yieldStrength),
      mpa(m.tensileStrength),
      m.density === undefined ? '—' : sig(m.density, 4),
      m.strengthBasis ?? '—',
    ]),
  ];
  const lines = textTable(rows);
  lines.push('', 'Sources:');
  for (const m of list) lines.push(`  ${m.key}: ${m.source}`);
  lines.push('', 'Strengths marked "minimum" are published minima: a real bar is usually stronger.');
  return lines.join('\n') + '\n';
}
