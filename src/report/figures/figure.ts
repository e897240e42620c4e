/** A figure for the report: a file name, a title and caption for the text, and standalone SVG. */
export interface Figure {
  /** File-name stem, such as "dynamic-torque". */
  name: string;
  title: string;
  caption: string;
  /** A complete `<svg xmlns=…>` element. */
  svg: string;
}
