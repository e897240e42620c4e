import { MATERIAL_LIBRARY } from '../../materials/library.ts';
import { materialsToJson } from '../../views/materials-json.ts';
import { renderMaterials } from '../../views/materials-table.ts';
import type { Io } from '../io.ts';

export function materialsCommand(opts: { json?: boolean }, io: Io): void {
  io.out(opts.json ? JSON.stringify(materialsToJson(MATERIAL_LIBRARY), null, 2) + '\n' : renderMaterials(MATERIAL_LIBRARY));
}
