import { useTranslation } from 'react-i18next';

/** A field's value as plain text (objects such as a sample's observations as "key: value" pairs). */
function shown(value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (typeof value === 'object') return Object.entries(value as Record<string, unknown>).map(([k, v]) => `${k}: ${String(v)}`).join('; ') || '—';
  return String(value);
}

/**
 * The tablet's and the server's copy field by field; fields that differ are marked in words. A record
 * deleted on this tablet (`mine` null) has no copy here: the server's fields are shown alone.
 */
export function ConflictTable({ mine, server, serverVersion }: { mine: Record<string, unknown> | null; server: Record<string, unknown>; serverVersion: number }) {
  const { t } = useTranslation();
  const fields = [...new Set([...Object.keys(mine ?? {}), ...Object.keys(server)])];
  return (
    <div className="sb-table-wrap">
      <table className="sb-table sb-conflict-table">
        <thead>
          <tr>
            <th scope="col">{t('capture.conflict.field')}</th>
            {mine && <th scope="col">{t('capture.conflict.mine')}</th>}
            <th scope="col">{t('capture.conflict.server', { version: serverVersion })}</th>
          </tr>
        </thead>
        <tbody>
          {fields.map((field) => {
            const differs = mine !== null && shown(mine[field]) !== shown(server[field]);
            return (
              <tr key={field} className={differs ? 'sb-conflict-table__differs' : undefined}>
                <th scope="row">
                  {t(`capture.fields.${field}`, { defaultValue: field })}
                  {differs && <span className="sb-conflict-table__mark"> ({t('capture.conflict.differs')})</span>}
                </th>
                {mine && <td>{shown(mine[field])}</td>}
                <td>{shown(server[field])}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
