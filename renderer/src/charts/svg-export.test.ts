import { describe, expect, it } from 'vitest';
import { chartFileName, composeChartSvg, escapeXml, TITLE_BAND_PX } from './svg-export.js';

describe('chart as an SVG file', () => {
  const svg = composeChartSvg({
    title: 'Melanopic EDI at the eye — Baseline & "late"',
    width: 640.4,
    height: 360,
    chart: '<svg class="recharts-surface" width="640" height="360"><path d="M0 0L10 10"/></svg>',
    legend: [{ x: 100, y: 340, text: 'Daylight <windows>', colour: 'rgb(230, 159, 0)', icon: { x: 84, y: 330, markup: '<svg width="14" height="14"><path d="M0 7h14"/></svg>' } }],
    fontFamily: "system-ui, 'DejaVu Sans'",
    fontSize: 14,
  });

  it('is a stand-alone SVG document sized to the chart plus its title band', () => {
    expect(svg.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg).toContain(`width="641" height="${360 + TITLE_BAND_PX}"`);
    expect(svg).toContain('<path d="M0 0L10 10"/>');
    expect(svg.trim().endsWith('</svg>')).toBe(true);
  });

  it('escapes the title and legend text and places the legend below the title band', () => {
    expect(svg).toContain('<title>Melanopic EDI at the eye — Baseline &amp; &quot;late&quot;</title>');
    expect(svg).toContain(`<text x="100" y="${340 + TITLE_BAND_PX}" fill="rgb(230, 159, 0)">Daylight &lt;windows&gt;</text>`);
    expect(svg).toContain('font-family="system-ui, \'DejaVu Sans\'"');
    expect(escapeXml('a<b>&"c"')).toBe('a&lt;b&gt;&amp;&quot;c&quot;');
  });

  it('names the file after the chart', () => {
    expect(chartFileName('Melanopic EDI at the eye — Baseline', 'png')).toBe('melanopic-edi-at-the-eye-baseline.png');
    expect(chartFileName('DLMO by day', 'svg')).toBe('dlmo-by-day.svg');
    expect(chartFileName('—', 'svg')).toBe('chart.svg');
  });
});
