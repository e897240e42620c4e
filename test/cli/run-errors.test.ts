import { afterEach, describe, expect, it } from 'vitest';
import { runMain, systemClock } from '../../src/cli/main.ts';
import { sourceDateEpoch, UsageError } from '../../src/cli/run-errors.ts';

describe('sourceDateEpoch(value)', () => {
  it('reads whole seconds since 1970, and nothing when unset or empty', () => {
    expect(sourceDateEpoch('1767225600')?.toISOString()).toBe('2026-01-01T00:00:00.000Z');
    expect(sourceDateEpoch('0')?.toISOString()).toBe('1970-01-01T00:00:00.000Z');
    expect(sourceDateEpoch(undefined)).toBeUndefined();
    expect(sourceDateEpoch('')).toBeUndefined();
  });

  it.each(['abc', '-5', '1.5', '1e9', '99999999999999999999', '253402300800', ' 12'])('"%s" is refused as no time', (v) => {
    expect(() => sourceDateEpoch(v)).toThrow(UsageError);
    expect(() => sourceDateEpoch(v)).toThrow(/^SOURCE_DATE_EPOCH.* is not a time; give whole seconds since 1970-01-01 UTC from 0 to 253402300799/);
  });

  it('a value with control characters is not echoed', () => {
    expect(() => sourceDateEpoch('1\u001b[2J')).toThrow(/^SOURCE_DATE_EPOCH \(its value\) is not a time/);
  });
});

describe('runMain with a bad SOURCE_DATE_EPOCH', () => {
  const saved = process.env.SOURCE_DATE_EPOCH;
  afterEach(() => {
    if (saved === undefined) delete process.env.SOURCE_DATE_EPOCH;
    else process.env.SOURCE_DATE_EPOCH = saved;
  });

  it('report exits 2 with one line and writes nothing', async () => {
    process.env.SOURCE_DATE_EPOCH = 'yesterday';
    expect(() => systemClock()).toThrow(UsageError);
    let err = '';
    const code = await runMain(['report', 'no-such-case.yaml'], { out: () => {}, err: (t) => void (err += t) }, systemClock);
    expect(code).toBe(2);
    expect(err).toMatch(/^SOURCE_DATE_EPOCH="yesterday" is not a time; [^\n]*\n$/);
  });
});

describe('runMain: a file-system fault is one line and exit 1', () => {
  it('report with a file where reports/ belongs', async () => {
    const { mkdtempSync, copyFileSync, writeFileSync, readdirSync } = await import('node:fs');
    const { join } = await import('node:path');
    const { tmpdir } = await import('node:os');
    const dir = mkdtempSync(join(tmpdir(), 'shaftcase-fault-'));
    copyFileSync(new URL('../data/one-disc.yaml', import.meta.url), join(dir, 'case.yaml'));
    writeFileSync(join(dir, 'reports'), 'x');
    let err = '';
    const code = await runMain(['report', dir], { out: () => {}, err: (t) => void (err += t) }, () => new Date('2026-12-01T10:00:00Z'));
    expect(code).toBe(1);
    expect(err).toMatch(/^cannot write the reports folder .*: a file stands where a folder must be; move that file away \(EEXIST\); nothing was written\n$/);
    expect(readdirSync(dir).sort()).toEqual(['case.yaml', 'reports']);
  });
});
