/** Output channel of a command, so tests can run commands without a terminal. */
export interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
}
