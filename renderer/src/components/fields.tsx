// Form fields bound to a path in the scenario; every change is one undoable edit (typing in
// one field merges into a single step).
import { useEffect, useId, useState } from 'react';
import { useController } from '../state/workspace-context.js';
import { setAt, type JsonPath } from '../scenario/set-at.js';

interface FieldProps {
  readonly label: string;
  readonly path: JsonPath;
  readonly unit?: string;
  readonly hint?: string;
}

function editKey(path: JsonPath): string {
  return path.join('.');
}

export function NumberField({ label, path, unit, hint, value, min, max, step, compact, placeholder }: FieldProps & { value: number | undefined; min?: number; max?: number; step?: number; compact?: boolean; placeholder?: string }) {
  const controller = useController();
  const id = useId();
  const [text, setText] = useState(value === undefined ? '' : String(value));
  useEffect(() => setText(value === undefined ? '' : String(value)), [value]);
  return (
    <label className={compact === true ? 'field field-compact' : 'field'} htmlFor={id}>
      <span className={compact === true ? 'visually-hidden' : 'field-label'}>{label}</span>
      <span className="field-input">
        <input
          id={id}
          type="number"
          inputMode="decimal"
          value={text}
          placeholder={placeholder}
          min={min}
          max={max}
          step={step ?? 'any'}
          onChange={(e) => {
            setText(e.target.value);
            const n = e.target.valueAsNumber;
            if (e.target.value === '') controller.store.edit((s) => setAt(s, path, undefined), editKey(path));
            else if (Number.isFinite(n)) controller.store.edit((s) => setAt(s, path, n), editKey(path));
          }}
        />
        {unit !== undefined && <span className="unit">{unit}</span>}
      </span>
      {hint !== undefined && <span className="field-hint">{hint}</span>}
    </label>
  );
}

export function TextField({ label, path, hint, value, wide }: FieldProps & { value: string | undefined; wide?: boolean }) {
  const controller = useController();
  const id = useId();
  return (
    <label className={wide === true ? 'field field-wide' : 'field'} htmlFor={id}>
      <span className="field-label">{label}</span>
      <input id={id} type="text" value={value ?? ''} onChange={(e) => controller.store.edit((s) => setAt(s, path, e.target.value), editKey(path))} />
      {hint !== undefined && <span className="field-hint">{hint}</span>}
    </label>
  );
}

export function SelectField({ label, path, value, options }: FieldProps & { value: string | undefined; options: readonly { value: string; label: string }[] }) {
  const controller = useController();
  const id = useId();
  return (
    <label className="field" htmlFor={id}>
      <span className="field-label">{label}</span>
      <select id={id} value={value ?? ''} onChange={(e) => controller.store.edit((s) => setAt(s, path, e.target.value))}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </label>
  );
}
