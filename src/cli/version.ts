import { readFileSync } from 'node:fs';

/** The tool's version, from package.json (dist/src/cli/ and src/cli/ both sit three or two levels down). */
export function version(): string {
  for (const rel of ['../../../package.json', '../../package.json']) {
    try {
      const pkg = JSON.parse(readFileSync(new URL(rel, import.meta.url), 'utf8')) as { name?: string; version?: string };
      if (pkg.name === 'shaftcase' && pkg.version) return pkg.version;
    } catch {
      // try the next level up
    }
  }
  return '0.0.0';
}
