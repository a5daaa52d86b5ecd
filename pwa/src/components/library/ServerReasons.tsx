import { useTranslation } from 'react-i18next';

/** Every reason the server gave for refusing a save, one per line, announced as an alert. */
export function ServerReasons({ reasons }: { reasons: readonly string[] }) {
  const { t } = useTranslation();
  if (reasons.length === 0) return null;
  return (
    <div className="sb-error" role="alert" data-testid="server-error">
      <p>{t('library.editor.serverError', { count: reasons.length })}</p>
      <ul>
        {reasons.map((r) => (
          <li key={r} data-testid="server-reason">{r}</li>
        ))}
      </ul>
    </div>
  );
}
