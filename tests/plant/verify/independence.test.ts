// The audit must not lean on the linear model's builder: its files import only
// the case model, the property engine and each other.
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';

describe('src/plant/verify imports', () => {
  it('only ../../model, ../../properties and its own files', () => {
    const folder = 'src/plant/verify';
    const files = readdirSync(folder).filter((name) => name.endsWith('.ts'));
    expect(files.length).toBeGreaterThan(3);
    for (const file of files) {
      const text = readFileSync(`${folder}/${file}`, 'utf8');
      for (const match of text.matchAll(/from '([^']+)'/g)) {
        expect(/^(\.\.\/\.\.\/model\/index\.js|\.\.\/\.\.\/properties\/index\.js|\.\/[A-Za-z]+\.js)$/.test(match[1]), `${file} imports ${match[1]}`).toBe(true);
      }
    }
  });
});
