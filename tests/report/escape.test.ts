import { describe, expect, it } from 'vitest';
import { escapeMarkup } from '../../src/report/index.js';

describe('escapeMarkup', () => {
  it('replaces the five characters that carry meaning in HTML and XML', () => {
    expect(escapeMarkup(`<script>alert("x") & 'y'</script>`)).toBe('&lt;script&gt;alert(&quot;x&quot;) &amp; &#39;y&#39;&lt;/script&gt;');
  });

  it('escapes an ampersand that already looks like an entity, so it shows as written', () => {
    expect(escapeMarkup('&amp;')).toBe('&amp;amp;');
  });

  it('leaves other text, including non-ASCII, unchanged', () => {
    expect(escapeMarkup('Kühlhaus → 42.0 barg · 5 %')).toBe('Kühlhaus → 42.0 barg · 5 %');
  });
});
