// Hostile or broken files end quickly in one clear, located error.
import { expect, test } from 'vitest';
import { issuesOf, starter } from './caseText.js';

test('an alias bomb is refused', () => {
  const lines = ['a: &a ["x", "x", "x", "x", "x", "x", "x", "x", "x", "x"]'];
  for (let level = 1; level <= 9; level++) lines.push(`${String.fromCharCode(97 + level)}: &${String.fromCharCode(97 + level)} [${Array(10).fill(`*${String.fromCharCode(96 + level)}`).join(', ')}]`);
  expect(issuesOf(lines.join('\n'))).toMatchInlineSnapshot(`"case.yaml  the file expands YAML aliases more than 100 times; write the values out instead"`);
});

test('deep nesting is refused', () => {
  expect(issuesOf(`${'['.repeat(10_000)}${']'.repeat(10_000)}`)).toMatchInlineSnapshot(`"case.yaml  lists and maps nest more than 64 levels deep; a case file needs far fewer"`);
});

test('binary garbage is refused', () => {
  expect(issuesOf('format_version: 1\n\u0000\u0001\u0002\u00ff')).toMatchInlineSnapshot(`"case.yaml:2:1  expected a YAML text file, found binary data (a control character or invalid UTF-8)"`);
});

test('custom tags are refused', () => {
  expect(issuesOf('format_version: 1\nname: !!js/function "function () {}"\n')).toMatchInlineSnapshot(`"case.yaml:2:7  custom YAML tags are not part of the case format; found tag tag:yaml.org,2002:js/function"`);
});

test('a truncated file reports what is missing', () => {
  expect(issuesOf(starter.slice(0, starter.indexOf('headers:')))).toMatchInlineSnapshot(`
    "case.yaml:8:1  headers  missing key "headers": expected steam headers
    case.yaml:8:1  deaerator  missing key "deaerator": expected the deaerator"
  `);
});

test('an empty file', () => {
  expect(issuesOf('')).toMatchInlineSnapshot(`"case.yaml:1:1  the file is empty; expected a plant case (steamwright init FILE writes a starter)"`);
});

test('a file that is a list, not a map', () => {
  expect(issuesOf('- 1\n- 2\n')).toMatchInlineSnapshot(`"case.yaml:1:1  expected a map of keys at the top of the file, found a list"`);
});

test('YAML syntax errors are located', () => {
  expect(issuesOf('name: "unclosed\nsite: {')).toMatchInlineSnapshot(`"case.yaml:2:8  YAML syntax: Missing closing "quote"`);
});
