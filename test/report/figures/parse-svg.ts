import { DOMParser } from 'linkedom';

/** Parses SVG text as XML with linkedom's DOMParser, as a viewer would, and returns its root element. */
export function parseSvg(svg: string): Element {
  return new DOMParser().parseFromString(svg, 'image/svg+xml').documentElement as unknown as Element;
}
