import { useTranslation } from 'react-i18next';
import type { ScanServerCheck } from '../../db/scansTable';

/**
 * The server's recomputation of a scan: not yet, failed (or cannot reproduce the tablet's settings),
 * agrees, or differs (with each difference); and whether it ranked against another compound library.
 */
export function ServerCheckView({ check }: { check: ScanServerCheck | undefined }) {
  const { t } = useTranslation();
  let text = t('capture.scanDetail.serverPending');
  if (check?.serverRecomputeError) text = t('capture.scanDetail.serverFailed', { reason: check.serverRecomputeError });
  else if (check?.resultMismatch === false) text = t('capture.scanDetail.serverAgrees');
  else if (check?.resultMismatch === true) text = t('capture.scanDetail.serverDiffers');
  return (
    <div data-testid="server-check" data-mismatch={check ? String(check.resultMismatch) : 'pending'}>
      <p>{text}</p>
      {check?.otherLibrary && (
        <p data-testid="server-other-library">
          {t('capture.scanDetail.serverOtherLibrary', { tablet: check.otherLibrary.tablet ?? '—', server: check.otherLibrary.server ?? '—' })}
        </p>
      )}
      {check?.resultMismatch && (
        <ul>
          {check.differences.map((d) => (
            <li key={d}>{d}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
