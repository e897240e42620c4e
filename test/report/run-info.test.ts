import { afterEach, describe, expect, it } from 'vitest';
import { runInfo } from '../../src/report/run-info.ts';

describe('runInfo', () => {
  const tz = process.env.TZ;
  afterEach(() => {
    process.env.TZ = tz;
  });

  it('runInfo gives the local date, time and ISO moment with its UTC offset', () => {
    const at = new Date('2026-12-31T20:05:09Z');
    expect(runInfo(at, '1.2.3')).toEqual({ version: '1.2.3', date: '2026-12-31', time: '20:05 UTC+00:00', iso: '2026-12-31T20:05:09+00:00' });
    // India Standard Time is UTC+05:30 all year (no daylight saving): the local date is already the next day.
    process.env.TZ = 'Asia/Kolkata';
    expect(runInfo(at, '1.2.3')).toMatchObject({ date: '2027-01-01', time: '01:35 UTC+05:30', iso: '2027-01-01T01:35:09+05:30' });
    // Newfoundland in winter is UTC−03:30.
    process.env.TZ = 'America/St_Johns';
    expect(runInfo(at, '1.2.3').iso).toBe('2026-12-31T16:35:09-03:30');
  });
});
