import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { tempFolder } from '../io/io-fixtures.ts';
import { cli } from './run-cli.ts';

describe('shaftcase new', () => {
  it('new makes a case folder, says what it made and what to do next, and check then lists what is missing', async () => {
    const dir = join(tempFolder(), 'INC-9');
    const made = await cli(['new', dir, '--units', 'us']);
    expect(made.code).toBe(0);
    expect(made.out).toContain(`Created the case folder ${dir} (us units):\n  ${dir}\n  ${join(dir, 'photos')}\n  ${join(dir, 'case.yaml')}\n  ${join(dir, 'README.md')}\n`);
    expect(made.out).toContain(`then run: shaftcase check ${dir}   and   shaftcase report ${dir}`);
    const check = await cli(['check', dir]);
    expect(check.code).toBe(2);
    expect(check.err).toMatch(/case\.yaml:\d+:\d+ case\.id: is required/);
    expect(check.err).toMatch(/case\.yaml:\d+:\d+ speed: is required/);
  });

  it('new refuses to overwrite an existing case, with exit status 2, and leaves it untouched', async () => {
    const dir = join(tempFolder(), 'INC-10');
    await cli(['new', dir]);
    const before = readFileSync(join(dir, 'case.yaml'));
    const again = await cli(['new', dir, '--units', 'us']);
    expect(again.code).toBe(2);
    expect(again.err).toMatch(/case\.yaml: a case is already here, and shaftcase new never overwrites one/);
    expect(readFileSync(join(dir, 'case.yaml')).equals(before)).toBe(true);
  });

  it('new refuses units other than metric and us', async () => {
    const dir = join(tempFolder(), 'INC-11');
    const run = await cli(['new', dir, '--units', 'imperial']);
    expect(run.code).toBe(2);
    expect(run.err).toMatch(/Allowed choices are metric, us/);
    expect(existsSync(dir)).toBe(false);
  });
});
