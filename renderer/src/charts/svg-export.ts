// A chart as a stand-alone SVG document: the chart's own SVG drawing, its title above and the
// legend entries (drawn on screen as HTML beside the SVG) placed where they appear, on a white
// ground, with the page's font named on the root so the file draws the same anywhere. Pure
// string assembly (the page collects the parts: views/chart-export.ts).

export interface SvgLegendEntry {
  /** Position of the text baseline's start and of the icon, in the chart's pixel frame. */
  readonly x: number;
  readonly y: number;
  readonly text: string;
  readonly colour: string;
  /** The icon's own SVG markup (as drawn on screen), placed at (iconX, iconY); null for none. */
  readonly icon: { readonly x: number; readonly y: number; readonly markup: string } | null;
}

export interface ChartSvgParts {
  readonly title: string;
  readonly width: number;
  readonly height: number;
  /** The chart's <svg> element as markup. */
  readonly chart: string;
  readonly legend: readonly SvgLegendEntry[];
  readonly fontFamily: string;
  readonly fontSize: number;
}

/** Height of the title band above the chart, px. */
export const TITLE_BAND_PX = 28;

export function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

const num = (v: number) => String(Math.round(v * 100) / 100);

/** The whole SVG document for a chart. */
export function composeChartSvg(parts: ChartSvgParts): string {
  const w = Math.max(1, Math.ceil(parts.width));
  const h = Math.max(1, Math.ceil(parts.height)) + TITLE_BAND_PX;
  const legend = parts.legend
    .map((e) => {
      const icon = e.icon === null ? '' : `<g transform="translate(${num(e.icon.x)} ${num(e.icon.y + TITLE_BAND_PX)})">${e.icon.markup}</g>`;
      return `${icon}<text x="${num(e.x)}" y="${num(e.y + TITLE_BAND_PX)}" fill="${escapeXml(e.colour)}">${escapeXml(e.text)}</text>`;
    })
    .join('');
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}" font-family="${escapeXml(parts.fontFamily)}" font-size="${num(parts.fontSize)}">`,
    `<title>${escapeXml(parts.title)}</title>`,
    `<rect x="0" y="0" width="${w}" height="${h}" fill="#ffffff"/>`,
    `<text x="8" y="19" font-size="${num(parts.fontSize + 1)}" font-weight="600" fill="#1b2430">${escapeXml(parts.title)}</text>`,
    `<g transform="translate(0 ${TITLE_BAND_PX})">${parts.chart}</g>`,
    legend,
    '</svg>',
    '',
  ].join('\n');
}

/** A file name from a chart title: lower case, words joined by hyphens, at most 60 characters. */
export function chartFileName(title: string, extension: 'svg' | 'png'): string {
  const base =
    title
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60)
      .replace(/-+$/g, '') || 'chart';
  return `${base}.${extension}`;
}
