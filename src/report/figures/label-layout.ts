/** Width of one character of the figures' 9–10 px text, px (Plot cannot measure text in Node; an estimate on the wide side). */
const CHAR_PX = 6;

/** A label placed: its anchor (so it never runs past the figure's edges) and its row (so no two overlap). */
export interface PlacedLabel<T> {
  item: T;
  anchor: 'start' | 'middle' | 'end';
  row: number;
  /** Its extent across, px. */
  left: number;
  right: number;
}

/**
 * Places labels along one line of the figure: each centred on its point where it fits, else
 * anchored at its start or end so it stays inside [0, width]; labels that would overlap one
 * another go to the next row down. Pure, so a test can check that none overlaps or clips.
 */
export function placeLabels<T>(items: readonly T[], px: (t: T) => number, text: (t: T) => string, width: number): PlacedLabel<T>[] {
  const rows: number[] = []; // the right edge of the last label in each row
  return [...items]
    .sort((a, b) => px(a) - px(b))
    .map((item) => {
      const x = px(item);
      const w = text(item).length * CHAR_PX;
      let anchor: PlacedLabel<T>['anchor'] = 'middle';
      let left = x - w / 2;
      if (left < 0) {
        anchor = 'start';
        left = x;
      } else if (x + w / 2 > width) {
        anchor = 'end';
        left = x - w;
      }
      left = Math.max(0, Math.min(left, width - w));
      const right = left + w;
      let row = rows.findIndex((edge) => edge + 4 <= left);
      if (row < 0) row = rows.push(-Infinity) - 1;
      rows[row] = right;
      return { item, anchor, row, left, right };
    });
}
