import { describe, expect, it } from 'vitest';
import { CaseError } from '../../src/case/case-error.ts';
import { fillTemplate, type TemplateInput } from '../../src/report/fill-template.ts';

const input: TemplateInput = {
  fields: { 'case.id': 'INC-1', 'run.date': '2026-12-01' },
  sections: [
    { id: 'summary', markdown: '## Summary\n\nS.' },
    { id: 'method', markdown: '## Method\n\nM.' },
    { id: 'cautions', markdown: '## Cautions\n\nC.' },
  ],
};

describe('fillTemplate', () => {
  it('fillTemplate puts fields and every section for {{sections}}, in order', () => {
    expect(fillTemplate('# Report {{case.id}} of {{ run.date }}\n\n{{sections}}\n', 't.md', input)).toBe('# Report INC-1 of 2026-12-01\n\n## Summary\n\nS.\n\n## Method\n\nM.\n\n## Cautions\n\nC.\n');
  });

  it('{{section:ID}} places one section, and {{sections}} then holds only the others', () => {
    expect(fillTemplate('{{section:method}}\n\nHeader\n\n{{sections}}', 't.md', input)).toBe('## Method\n\nM.\n\nHeader\n\n## Summary\n\nS.\n\n## Cautions\n\nC.\n');
  });

  it('a line holding only a comment is dropped whole, and an inline comment leaves its line', () => {
    expect(fillTemplate('{{! a comment\n  over two lines }}\n# A {{! inline }}B\n  {{! indented }}  \nC {{section:summary}}', 't.md', input)).toBe('# A B\nC ## Summary\n\nS.\n\n## Cautions\n\nC.\n');
  });

  it('the cautions are appended when a template places neither them nor {{sections}}', () => {
    const out = fillTemplate('# Site header\n\n{{section:summary}}\n\nSigned: ____\n', 't.md', input);
    expect(out).toBe('# Site header\n\n## Summary\n\nS.\n\nSigned: ____\n\n## Cautions\n\nC.\n');
  });

  it('an unknown placeholder is refused with its line and column and the names that exist', () => {
    const run = () => fillTemplate('# Title\n\nBy {{case.author}} and {{section:nope}}\n', 'site.md', input);
    expect(run).toThrow(CaseError);
    expect(run).toThrow(
      /^site\.md:3:4: unknown placeholder \{\{case\.author\}\}; give \{\{sections\}\}, \{\{section:ID\}\} or a field: case\.id, run\.date\nsite\.md:3:24: unknown section "nope"; give one of summary, method, cautions$/,
    );
  });

  it('an opening {{ without its closing }} is refused with its line', () => {
    expect(() => fillTemplate('ok\n\nbad {{case.id\n', 'site.md', input)).toThrow(/^site\.md:3:5: a "\{\{" without its closing "\}\}"/);
  });

  it('a section left out for this case leaves its placeholder empty without an error', () => {
    const fewer = { ...input, sections: input.sections.filter((s) => s.id !== 'method') };
    expect(fillTemplate('A\n\n{{section:method}}\n\nB {{section:cautions}}', 't.md', { ...fewer, knownSections: ['summary', 'method', 'cautions'] })).toBe('A\n\nB ## Cautions\n\nC.\n');
  });
});

describe('fillTemplate: malformed templates and prototype names', () => {
  const input: TemplateInput = {
    fields: { 'case.id': 'T-1' },
    sections: [
      { id: 'summary', markdown: '## Summary\n\nS.' },
      { id: 'cautions', markdown: '## Cautions\n\nC.' },
    ],
  };

  it('an unclosed comment is an error at its position, not a swallowed report', () => {
    expect(() => fillTemplate('# Title\n\n  {{! draft note\n{{sections}}\n', 'site.md', input)).toThrow(/^site\.md:3:3: a comment "\{\{!" without its closing "\}\}"/);
    expect(() => fillTemplate('# Title\n{{! never closed\n', 'site.md', input)).toThrow(/^site\.md:2:1: a "\{\{" without its closing "\}\}"/);
    expect(() => fillTemplate('A {{case.id\n\n{{sections}}', 'site.md', input)).toThrow(/^site\.md:1:3: a "\{\{" without its closing/);
  });

  it.each(['constructor', '__proto__', 'toString', 'hasOwnProperty', 'valueOf'])('{{%s}} is an unknown placeholder, not a property of every object', (name) => {
    expect(() => fillTemplate(`X {{${name}}}\n`, 'site.md', input)).toThrow(new RegExp(`unknown placeholder \\{\\{${name}\\}\\}`));
  });
});

describe('fillTemplate: control characters', () => {
  it('an escape sequence in a site template is refused with its position', () => {
    const input: TemplateInput = { fields: {}, sections: [{ id: 'cautions', markdown: '## Cautions\n\nC.' }] };
    expect(() => fillTemplate('# Site\n\nok \u001b[2J\n{{sections}}\n', 'site.md', input)).toThrow(/^site\.md:3:4: holds the control character U\+001B, which a report template may not hold/);
  });
});
