import { useId, useState, type FormEvent, type ReactNode } from 'react';
import { IonButton } from '@ionic/react';

/**
 * A text edited in place: the field, an optional hint under it, Save and Cancel. A failed save shows its
 * reason and keeps the draft; a saved one closes the form (`onDone`).
 */
export function TextEditForm({
  label,
  initial,
  hint,
  saveLabel,
  cancelLabel,
  onSave,
  onDone,
  testId,
}: {
  label: string;
  initial: string;
  /** Shown under the field, given the draft (a character count, say). */
  hint?: (draft: string) => ReactNode;
  saveLabel: string;
  cancelLabel: string;
  onSave: (text: string) => Promise<void>;
  onDone: () => void;
  testId?: string;
}) {
  const [draft, setDraft] = useState(initial);
  const [error, setError] = useState<string>();
  const inputId = useId();
  const hintId = useId();

  async function save(event: FormEvent) {
    event.preventDefault();
    try {
      await onSave(draft);
      onDone();
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    }
  }

  return (
    <form onSubmit={save} noValidate data-testid={testId}>
      <div className="sb-field">
        <label htmlFor={inputId}>{label}</label>
        <textarea
          id={inputId}
          className="sb-text sb-text--area"
          rows={3}
          value={draft}
          aria-describedby={hint ? hintId : undefined}
          aria-invalid={error ? true : undefined}
          onChange={(e) => setDraft(e.target.value)}
        />
        {hint && (
          <p id={hintId} className="sb-field__hint">
            {hint(draft)}
          </p>
        )}
      </div>
      {error && (
        <p className="sb-error" role="alert">
          {error}
        </p>
      )}
      <div className="sb-button-row">
        <IonButton type="submit" className="sb-primary">
          {saveLabel}
        </IonButton>
        <IonButton fill="outline" onClick={onDone}>
          {cancelLabel}
        </IonButton>
      </div>
    </form>
  );
}
