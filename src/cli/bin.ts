#!/usr/bin/env node
import { runMain } from './main.ts';

// A closed or full standard output (`| head`, `> /dev/full`) is an error, exit 1, said once on
// stderr, never a stack trace nor exit 0.
let outputFailed = false;
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (!outputFailed) process.stderr.write(`shaftcase: the output could not be written (${e.code ?? e.message}): it was closed or the disk is full\n`);
  outputFailed = true;
  process.exitCode = 1;
});

const code = await runMain(process.argv.slice(2));
process.exitCode = outputFailed ? 1 : code;
