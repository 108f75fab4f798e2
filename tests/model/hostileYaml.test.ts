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

test('exactly 100 aliases are not "more than 100"; 101 are', () => {
  const aliases = (count: number): string => `x: &a 1\nl: [${Array(count).fill('*a').join(', ')}]\n`;
  expect(issuesOf(aliases(100))).not.toMatch(/aliases/);
  expect(issuesOf(aliases(101))).toMatch(/the file expands YAML aliases more than 100 times/);
});

test('an alias with no anchor is named, not taken for an alias bomb', () => {
  expect(issuesOf('format_version: 1\nname: *plant\n')).toMatchInlineSnapshot(`"case.yaml:2:7  the alias *plant has no anchor &plant before it; define the anchor first or write the value out"`);
});

test('a file of bare carriage returns is not "empty"', () => {
  expect(issuesOf('\r\r\r')).toMatchInlineSnapshot(`"case.yaml:1:1  the file ends a line with a bare carriage return (CR, as old Mac editors wrote); save it with LF or CRLF line ends"`);
  expect(issuesOf('format_version: 1\r\nname: x\rsite: {}\r\n')).toMatch(/^case\.yaml:2:8 {2}the file ends a line with a bare carriage return/);
});

test('brackets in a quoted string or a comment are not nesting', () => {
  const text = `format_version: 1\nname: "${'['.repeat(100)}" # ${'{'.repeat(100)}\nsite: '${']'.repeat(3)}[[['\n`;
  expect(issuesOf(text)).not.toMatch(/nest/);
  expect(issuesOf(text)).toMatch(/missing key "headers"/);
});

test('a second YAML document gets its own located message', () => {
  expect(issuesOf('format_version: 1\n---\nname: x\n')).toMatchInlineSnapshot(`"case.yaml:2:1  a second YAML document starts here ("---" after content); a case file is one document: remove the "---" or split the file"`);
});

test('merge keys and !!merge are refused where they stand, never dropped', () => {
  expect(issuesOf('format_version: 1\nbase: &b {x: 1}\nsite:\n  <<: *b\n')).toMatchInlineSnapshot(`"case.yaml:4:3  YAML merge keys (<<) are not part of the case format; write the keys out in full"`);
  expect(issuesOf('format_version: 1\nname: !!merge x\n')).toMatch(/^case\.yaml:2:\d+ {2}YAML merge \(!!merge\) is not part of the case format/);
});

test('block nesting deep enough to overflow the parser gets a located message', () => {
  // About 1500 levels of block maps, under the 2 MB limit.
  const text = `a:\n${Array.from({ length: 1500 }, (_, level) => `${' '.repeat(level + 1)}b:\n`).join('')}`;
  expect(issuesOf(text)).toMatch(/^case\.yaml(:\d+:\d+)? {2}(the file nests too deeply to read here|lists and maps nest more than 64 levels deep)/);
});
