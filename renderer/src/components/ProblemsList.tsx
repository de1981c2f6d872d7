// Problems the scenario format's checks found, each with its path and how to fix it.
import type { ScenarioProblem } from '../../../schedules/validation/problem.js';

export function ProblemsList({ problems }: { problems: readonly ScenarioProblem[] }) {
  if (problems.length === 0) return null;
  const errors = problems.filter((p) => p.severity === 'error').length;
  return (
    <details className={errors > 0 ? 'problems problems-error' : 'problems'} open={errors > 0}>
      <summary>
        {errors > 0 ? `${errors} problem${errors === 1 ? '' : 's'} to fix` : 'No errors'}
        {problems.length - errors > 0 && ` · ${problems.length - errors} warning${problems.length - errors === 1 ? '' : 's'}`}
      </summary>
      <ul>
        {problems.map((p, i) => (
          <li key={i} className={`problem problem-${p.severity}`}>
            <code>{p.path === '' ? '(file)' : p.path}</code> {p.message} <span className="muted">— {p.fix}</span>
          </li>
        ))}
      </ul>
    </details>
  );
}
