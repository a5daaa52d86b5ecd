import { useId, type ReactNode } from 'react';
import './cases.css';

interface FieldProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  type?: 'text' | 'number' | 'datetime-local' | 'date' | 'search';
  multiline?: boolean;
  hint?: ReactNode;
  required?: boolean;
  autoComplete?: string;
  inputMode?: 'decimal' | 'text';
  step?: string;
}

/** A labelled text control sized for gloved hands; the hint is tied to it for screen readers. */
export function Field({ label, value, onChange, type = 'text', multiline = false, hint, required, autoComplete = 'off', inputMode, step }: FieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const common = {
    id,
    value,
    required,
    'aria-describedby': hint ? hintId : undefined,
    className: multiline ? 'sb-text sb-text--area' : 'sb-text',
  };
  return (
    <div className="sb-field">
      <label htmlFor={id}>{label}</label>
      {multiline ? (
        <textarea {...common} rows={3} onChange={(e) => onChange(e.target.value)} />
      ) : (
        <input {...common} type={type} autoComplete={autoComplete} inputMode={inputMode} step={step} onChange={(e) => onChange(e.target.value)} />
      )}
      {hint && (
        <p id={hintId} className="sb-field__hint">
          {hint}
        </p>
      )}
    </div>
  );
}
