// Writes the JSON Schemas under schemas/ from the built sources (npm run schemas); a test checks
// that the files in the repository are what this writes, so they never drift from the reader.
import { writeFileSync } from 'node:fs';
import { caseJsonSchema } from '../dist/src/case/case-json-schema.js';
import { resultsJsonSchema } from '../dist/src/views/results-json-schema.js';

const write = (name, schema) => writeFileSync(new URL(`../schemas/${name}`, import.meta.url), JSON.stringify(schema, null, 2) + '\n');
write('case.schema.json', caseJsonSchema());
write('results.schema.json', resultsJsonSchema());
