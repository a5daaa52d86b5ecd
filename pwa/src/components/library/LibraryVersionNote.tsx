import { useTranslation } from 'react-i18next';
import type { LibraryView } from '../../features/library/readLibrary';
import { formatDateTime } from '../../i18n/format';

/** Which library is on screen: its version, and whether it came from the server, the tablet or the app. */
export function LibraryVersionNote({ view }: { view: LibraryView }) {
  const { t, i18n } = useTranslation();
  const { version } = view.library;
  return (
    <div className="sb-library-version" data-testid="library-version">
      <p>
        <strong>{t('library.list.version', { version: version.version, date: version.date })}</strong>{' '}
        {view.source === 'bundled' && t('library.list.fromBundled')}
        {view.source === 'tablet' && t('library.list.fromTablet', { when: formatDateTime(view.receivedAt ?? 0, i18n.language) })}
        {view.source === 'server' && t('library.list.fromServer')}
      </p>
      {view.problem && (
        <p className="sb-error" role="alert">
          {t('library.list.serverProblem', { message: view.problem })}
        </p>
      )}
    </div>
  );
}
