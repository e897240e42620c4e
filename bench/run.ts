// `npm run bench`: timings that matter to people running the tool by hand. Not a test: it prints.
import { benchUncertainty } from './uncertainty-bench.ts';

for (const line of benchUncertainty()) console.log(line);
