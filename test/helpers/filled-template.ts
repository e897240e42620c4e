// A case template as a user fills it in: its required values given with the template's own example
// values (shared by the template, plausibility and template-block tests).
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** The template's text as shipped. */
export function template(name: string): string {
  return readFileSync(fileURLToPath(new URL(`../../templates/${name}`, import.meta.url)), 'utf8');
}

/** `text` (a template) with every required value filled in. */
export function fillRequired(text: string): string {
  return text
    .replace(/^( {2}id:)/m, '$1 INC-1')
    .replace(/^(speed:)/m, '$1 420 rpm')
    .replace(/^( {2}at:)( +#)/m, '$1 rotor$2')
    .replace(/^( {2}material:)\s*$/m, '$1 aisi-1045-cd')
    .replace('{ length: , diameter: ,', '{ length: 20 in, diameter: 2 in,')
    .replace(/^( {2}- name:)( +# REQUIRED\. Your name)/m, '$1 drive pulley$2')
    .replace(/^( {4}at:)( +# REQUIRED\. Distance)/m, '$1 2 in$2')
    .replace('{ shape: disc, name: , diameter: , thickness: ,', '{ shape: disc, name: pulley, diameter: 10 in, thickness: 2 in,')
    .replace('bore: , material: }', 'bore: , material: gray-iron-30 }')
    .replace(/^( {2}- name:)( +# REQUIRED\. The station)/m, '$1 rotor$2')
    .replace(/^( {4}at:)( +# REQUIRED\.)$/m, '$1 18 in$2');
}
