import { useId } from 'react';
import { IonButton } from '@ionic/react';

/** A labelled multi-line text box, as large as gloved hands need. */
export function TextAreaField({ label, value, onChange, maxLength }: { label: string; value: string; onChange: (value: string) => void; maxLength: number }) {
  const id = useId();
  return (
    <div className="sb-field">
      <label htmlFor={id}>{label}</label>
      <textarea id={id} className="sb-textarea" maxLength={maxLength} value={value} onChange={(e) => onChange(e.target.value)} />
    </div>
  );
}

/** The end of an escalation form: why it was refused, if it was, and the big submit button. */
export function FormFooter({ problem, pending, label, pendingLabel, primary = true }: { problem?: string; pending: boolean; label: string; pendingLabel: string; primary?: boolean }) {
  return (
    <>
      {problem && (
        <p className="sb-error" role="alert">
          {problem}
        </p>
      )}
      <IonButton type="submit" className={primary ? 'sb-primary sb-big-button' : 'sb-big-button'} fill={primary ? 'solid' : 'outline'} disabled={pending}>
        {pending ? pendingLabel : label}
      </IonButton>
    </>
  );
}
