/**
 * Progress of the dynamic-model samples on a terminal: after the first sample it states the
 * estimated time when that exceeds a few seconds, then updates one line on stderr. Silent when
 * stderr is not a terminal (pipes, CI, tests), so output stays clean.
 */
export function terminalProgress(label: string, stream: NodeJS.WriteStream = process.stderr): ((done: number, total: number) => void) | undefined {
  if (!stream.isTTY) return undefined;
  const start = Date.now();
  return (done, total) => {
    const elapsed = (Date.now() - start) / 1000;
    const left = (elapsed / done) * (total - done);
    if (done === 1 && left > 3) stream.write(`${label}: ${total} samples, about ${Math.ceil(left)} s\n`);
    stream.write(`\r${label}: ${done}/${total}${done < total ? `, about ${Math.ceil(left)} s left` : ', done'}   `);
    if (done === total) stream.write('\n');
  };
}
