import { MATERIAL_LIBRARY } from '../../materials/library.ts';
import { materialsToJson } from '../../views/materials-json.ts';
import { renderMaterials } from '../../views/materials-table.ts';
import type { Io } from '../io.ts';
import { UsageError } from '../run-errors.ts';
import { materialsToYaml } from '../../views/materials-yaml.ts';

export function materialsCommand(opts: { json?: boolean; yaml?: boolean }, io: Io): void {
  if (opts.json && opts.yaml) throw new UsageError('give --json or --yaml, not both');
  io.out(opts.json ? JSON.stringify(materialsToJson(MATERIAL_LIBRARY), null, 2) + '\n' : opts.yaml ? materialsToYaml(MATERIAL_LIBRARY) : renderMaterials(MATERIAL_LIBRARY));
}
