#!/usr/bin/env node
import { runMain } from './main.ts';

process.exitCode = await runMain(process.argv.slice(2));
