// Checks every figure of the report must pass, shared by the figure tests.
import { parseHTML } from 'linkedom';
import { expect } from 'vitest';
import type { ReportFigure } from '../../../src/report/figures/report-figure.ts';

/** Parses a figure's SVG as a document of its own and checks what every figure carries. */
export function checkFigure(f: ReportFigure, name: string, axisLabels: RegExp[]): Document {
  expect(f.name).toBe(name);
  expect(f.svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
  const { document } = parseHTML(`<html><body>${f.svg}</body></html>`);
  const svg = document.querySelector('body > svg')!;
  expect(Number(svg.getAttribute('width'))).toBeGreaterThan(0);
  expect(Number(svg.getAttribute('height'))).toBeGreaterThan(0);
  expect(document.querySelector('svg > title')!.textContent).toBe(f.title);
  expect(document.querySelector('svg > desc')!.textContent).toBe(f.caption);
  const texts = [...document.querySelectorAll('text')].map((t) => t.textContent ?? '');
  expect(texts[0]).toBe(f.title);
  // The caption is drawn in, wrapped over lines.
  expect(texts.join(' ')).toContain(f.caption.split(' ').slice(0, 6).join(' '));
  for (const label of axisLabels)
    expect(
      texts.some((t) => label.test(t)),
      String(label),
    ).toBe(true);
  return document as unknown as Document;
}

/** SVG text with every number rounded to one decimal, for snapshots that ignore float noise. */
export function roundNumbers(svg: string): string {
  return svg.replace(/-?\d+\.\d+/g, (n) => String(Math.round(Number(n) * 10) / 10));
}

/**
 * The chart's x scale read back from its tick labels (value → px), for a linear axis: a straight
 * line through the first and last labelled ticks. Lets a test check where a mark was drawn
 * without trusting the code that drew it.
 */
export function xScaleFromTicks(document: Document): (value: number) => number {
  const ticks = [...document.querySelectorAll('[aria-label="x-axis tick label"] text')].map((t) => ({
    value: Number((t.textContent ?? '').replace(/,/g, '').replace('−', '-')),
    px: Number(/translate\(([-\d.]+),/.exec(t.getAttribute('transform') ?? '')![1]),
  }));
  const [a, b] = [ticks[0], ticks[ticks.length - 1]];
  return (v) => a.px + ((v - a.value) * (b.px - a.px)) / (b.value - a.value);
}
