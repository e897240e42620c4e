// Bundles the command-line tool (dist/src/cli/bin.js, built by tsc) and the libraries it uses
// into a few files in dist/cli/, one chunk per command loaded when that command runs. Node
// resolves, reads and links each ES module apart; the tool and its libraries are some 700 small
// modules (the report's figure library alone is hundreds), and loading them one by one cost more
// CPU than `check` computes for a simple case. The library entry point (dist/src/index.js) is
// not bundled. playwright-core (only for --pdf) stays outside: it is large and loads its own parts.
import { rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { rolldown } from 'rolldown';

const root = fileURLToPath(new URL('..', import.meta.url));
const out = `${root}dist/cli`;
rmSync(out, { recursive: true, force: true });
const bundle = await rolldown({
  input: { bin: `${root}dist/src/cli/bin.js` },
  platform: 'node',
  external: (id) => id.startsWith('node:') || id === 'playwright-core' || id.startsWith('playwright-core/'),
  logLevel: 'silent',
});
await bundle.write({ dir: out, format: 'esm', chunkFileNames: '[name]-[hash].js', comments: { legal: true } });
await bundle.close();
