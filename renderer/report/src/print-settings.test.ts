import { describe, expect, it } from 'vitest';
import { documentInfo, escapeHtml, printSettings } from './print-settings.js';

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

  it('names the scenario as title and subject of the PDF and the product as its creator', () => {
    expect(documentInfo('Ward B', '0.1.0')).toEqual({ title: 'Ward B — lighting and body-clock briefing', subject: 'Ward B', creator: 'Zeitlight 0.1.0', producer: 'Zeitlight 0.1.0 (printed with Chromium)' });
    expect(printSettings('Ward B', 'A4', '2026-12-01', '0.1.0').info?.creator).toBe('Zeitlight 0.1.0');
  });
});
