import { lazy, Suspense } from 'react';
import { useTranslation } from 'react-i18next';
import type { SpectrumPlotProps } from './SpectrumPlot';

// uPlot loads only when a scan is drawn, keeping it out of the first paint.
const SpectrumPlot = lazy(() => import('./SpectrumPlot'));

/** The spectrum plot, loaded on first use. */
export function LazySpectrumPlot(props: SpectrumPlotProps) {
  const { t } = useTranslation();
  return (
    <Suspense fallback={<p className="sb-muted">{t('identify.plot.loading')}</p>}>
      <SpectrumPlot {...props} />
    </Suspense>
  );
}
