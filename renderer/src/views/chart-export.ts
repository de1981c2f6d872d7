// Export of a chart on screen as SVG or PNG. SVG: the chart's SVG drawing (recharts' surface, or
// the view's own SVG) with its title and the HTML legend entries placed where they show
// (charts/svg-export.ts). PNG: that SVG drawn on a canvas at twice the screen size. Both are
// handed to the browser as a download (a save dialog in the desktop app).
import { chartFileName, composeChartSvg, TITLE_BAND_PX, type SvgLegendEntry } from '../charts/svg-export.js';

const PNG_SCALE = 2;

function download(name: string, blob: Blob): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** The chart's drawing: the recharts surface, else the first SVG marked as the chart. */
function chartSvg(figure: HTMLElement): SVGSVGElement | null {
  return figure.querySelector<SVGSVGElement>('.recharts-wrapper > svg.recharts-surface, svg[data-chart-svg]');
}

/** Legend entries drawn as HTML (recharts' legend, or items marked data-export-legend), in the chart's frame. */
function legendEntries(figure: HTMLElement, frame: DOMRect): SvgLegendEntry[] {
  const items = figure.querySelectorAll<HTMLElement>('.recharts-legend-item, [data-export-legend]');
  return [...items].map((item) => {
    const text = item.querySelector<HTMLElement>('.recharts-legend-item-text, [data-export-legend-text]') ?? item;
    const icon = item.querySelector<SVGSVGElement>('svg');
    const t = text.getBoundingClientRect();
    const style = getComputedStyle(text);
    const fontSize = parseFloat(style.fontSize) || 12;
    const iconRect = icon?.getBoundingClientRect();
    return {
      x: t.left - frame.left,
      // baseline ≈ top + ascent (0.8 em for common sans fonts)
      y: t.top - frame.top + 0.8 * fontSize + Math.max(0, (t.height - fontSize) / 2),
      text: (text.textContent ?? '').trim(),
      colour: style.color,
      icon: icon === null || iconRect === undefined ? null : { x: iconRect.left - frame.left, y: iconRect.top - frame.top, markup: icon.outerHTML },
    };
  });
}

/** The figure's chart as an SVG document, or null when it has no drawing yet. */
export function chartSvgDocument(figure: HTMLElement, title: string): { svg: string; width: number; height: number } | null {
  const svg = chartSvg(figure);
  if (svg === null) return null;
  const wrapper = (svg.closest('.recharts-wrapper') as HTMLElement | null) ?? svg;
  const frame = wrapper.getBoundingClientRect();
  const surface = svg.getBoundingClientRect();
  const clone = svg.cloneNode(true) as SVGSVGElement;
  clone.setAttribute('x', String(surface.left - frame.left));
  clone.setAttribute('y', String(surface.top - frame.top));
  clone.setAttribute('width', String(surface.width));
  clone.setAttribute('height', String(surface.height));
  clone.removeAttribute('style');
  const style = getComputedStyle(svg);
  const width = Math.max(frame.width, surface.width);
  const height = Math.max(frame.height, surface.height);
  return {
    svg: composeChartSvg({ title, width, height, chart: clone.outerHTML, legend: legendEntries(figure, frame), fontFamily: style.fontFamily, fontSize: parseFloat(style.fontSize) || 14 }),
    width,
    height,
  };
}

async function pngOf(svgText: string, width: number, height: number): Promise<Blob> {
  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.decoding = 'sync';
    const loaded = new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('the chart could not be drawn as an image'));
    });
    image.src = url;
    await loaded;
    const canvas = document.createElement('canvas');
    canvas.width = Math.ceil(width * PNG_SCALE);
    canvas.height = Math.ceil(height * PNG_SCALE);
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('no canvas to draw the chart on');
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, canvas.width, canvas.height);
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b === null ? reject(new Error('the PNG could not be made')) : resolve(b)), 'image/png'));
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Exports the chart inside `figure`; resolves to the file name, or rejects with a plain reason. */
export async function exportChart(figure: HTMLElement, title: string, format: 'svg' | 'png'): Promise<string> {
  const doc = chartSvgDocument(figure, title);
  if (doc === null) throw new Error('the chart has not been drawn yet');
  const name = chartFileName(title, format);
  if (format === 'svg') download(name, new Blob([doc.svg], { type: 'image/svg+xml' }));
  else download(name, await pngOf(doc.svg, doc.width, doc.height + TITLE_BAND_PX));
  return name;
}
