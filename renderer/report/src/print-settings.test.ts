import { describe, expect, it } from 'vitest';
import { escapeHtml, printSettings } from './print-settings.js';

describe('print header and footer', () => {
  it('puts the scenario name in the header, escaped, and Chromium page-number fields in the footer', () => {
    const s = printSettings('Ward <B> & "C"', 'Letter', '2026-12-01');
    expect(s.headerTemplate).toContain('Ward &lt;B&gt; &amp; &quot;C&quot;');
    expect(s.headerTemplate).not.toContain('<B>');
    // class names Chromium fills in (Chrome DevTools Protocol Page.printToPDF headerTemplate)
    expect(s.footerTemplate).toContain('class="pageNumber"');
    expect(s.footerTemplate).toContain('class="totalPages"');
    expect(s.paper).toBe('Letter');
  });

  it('escapes all five HTML special characters', () => {
    expect(escapeHtml(`<a href='x'>"&"</a>`)).toBe('&lt;a href=&#39;x&#39;&gt;&quot;&amp;&quot;&lt;/a&gt;');
  });
});
