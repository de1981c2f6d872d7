// A chart with its title for export and a small export button pair (SVG, PNG) in its corner.
import { useRef, useState, type ReactNode } from 'react';
import { exportChart } from './chart-export.js';

export function ChartFigure({ label, className, heading, caption, children }: { label: string; className?: string; heading?: ReactNode; caption?: ReactNode; children: ReactNode }) {
  const ref = useRef<HTMLElement>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const run = (format: 'svg' | 'png') => {
    const figure = ref.current;
    if (figure === null) return;
    setProblem(null);
    exportChart(figure, label, format).catch((error: unknown) => setProblem(`Export failed: ${error instanceof Error ? error.message : String(error)}`));
  };
  return (
    <figure className={className === undefined ? 'chart' : `chart ${className}`} aria-label={label} ref={ref}>
      <div className="chart-export" role="group" aria-label={`Export ${label}`}>
        <button type="button" className="chart-export-button" aria-label={`Export ${label} as SVG`} title="Download this chart as SVG (vector)" onClick={() => run('svg')}>
          SVG
        </button>
        <button type="button" className="chart-export-button" aria-label={`Export ${label} as PNG`} title="Download this chart as PNG (image)" onClick={() => run('png')}>
          PNG
        </button>
      </div>
      {heading !== undefined && <div className="chart-heading">{heading}</div>}
      {children}
      {caption !== undefined && <figcaption>{caption}</figcaption>}
      {problem !== null && (
        <p className="small empty-error" role="alert">
          {problem}
        </p>
      )}
    </figure>
  );
}
