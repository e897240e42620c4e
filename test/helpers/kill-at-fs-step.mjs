// A preload for the killed-report tests (node --import this-file dist/cli/bin.js report …):
// it counts the calls that change the file system under a `reports` folder (mkdir, write, rename,
// link, remove; a call made inside another, as rmSync's own unlink, is not counted) and sends the
// process SIGKILL right after the one SHAFTCASE_TEST_KILL_AFTER names: a step number (`17`), or
// the first call of a name whose path ends with a text (`renameSync`, `writeFileSync:.pending`).
// So a test can stop a real `report` between any two of its writes. With SHAFTCASE_TEST_FS_LOG=path
// it appends one line per call (`N name path`), so a test learns the steps of a whole run.
// Test-only: production code knows nothing of it.
import fs from 'node:fs';
import { syncBuiltinESMExports } from 'node:module';
import { sep } from 'node:path';

const killAfter = process.env.SHAFTCASE_TEST_KILL_AFTER ?? '';
const [killName, killEnd = ''] = killAfter.split(':');
const log = process.env.SHAFTCASE_TEST_FS_LOG;
const appendFileSync = fs.appendFileSync;
let step = 0;
let depth = 0;

const isKillPoint = (name, path) => (/^\d+$/.test(killAfter) ? step === Number(killAfter) : name === killName && path.endsWith(killEnd));

for (const name of ['mkdirSync', 'writeFileSync', 'renameSync', 'linkSync', 'rmSync', 'unlinkSync']) {
  const real = fs[name];
  fs[name] = function (path, ...rest) {
    depth += 1;
    let result;
    try {
      result = real.call(this, path, ...rest);
    } finally {
      depth -= 1;
    }
    const p = String(path);
    if (depth === 0 && p.includes(`${sep}reports`)) {
      step += 1;
      if (log) appendFileSync(log, `${step} ${name} ${p}\n`);
      if (isKillPoint(name, p)) process.kill(process.pid, 'SIGKILL');
    }
    return result;
  };
}
// The named exports (import { writeFileSync } from 'node:fs') follow the changed module object.
syncBuiltinESMExports();
