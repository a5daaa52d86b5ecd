import { useEffect, useRef } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { arrowBackOutline, arrowForwardOutline, expandOutline, removeOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { Technique } from '@siteband/shared';
import type { PlotData } from '../../features/identify/protocol';
import { formatCm1 } from '../../features/identify/format';
import { spectrumPlotOptions, themeColours, type Markers } from './plotOptions';
import './plot.css';

export interface SpectrumPlotProps {
  readonly plot: PlotData;
  readonly technique: Technique;
  /** Expected band positions of the selected candidate, drawn as dashed lines. */
  readonly expectedCm1?: readonly number[];
  /** The ordinate's name with its unit. */
  readonly yLabel: string;
  /** Legend words for the triangles and the dashed lines (they mean different things per screen). */
  readonly peaksKey: string;
  readonly expectedKey: string;
}

const HEIGHT = 380;

/**
 * The scan drawn with uPlot: drag across to zoom, buttons to pan, zoom out and reset (gloved hands
 * cannot scroll a wheel). IR runs from high to low wavenumber as spectroscopists read it.
 */
export default function SpectrumPlot({ plot, technique, expectedCm1 = [], yLabel, peaksKey, expectedKey }: SpectrumPlotProps) {
  const { t, i18n } = useTranslation();
  const host = useRef<HTMLDivElement>(null);
  const chart = useRef<uPlot | null>(null);
  const markers = useRef<Markers>({ peaksCm1: plot.peaksCm1, expectedCm1 });
  markers.current = { peaksCm1: plot.peaksCm1, expectedCm1 };
  const xLabel = technique === 'ir' ? t('identify.plot.xIr') : t('identify.plot.xRaman');
  const language = i18n.language;

  useEffect(() => {
    const element = host.current;
    if (!element) return undefined;
    const options = spectrumPlotOptions({
      width: element.clientWidth || 800,
      height: HEIGHT,
      xLabel,
      yLabel,
      seriesLabel: t('identify.plot.series'),
      descendingX: technique === 'ir',
      colours: themeColours(element),
      markers: () => markers.current,
      formatX: (v) => formatCm1(v, language),
    });
    const u = new uPlot(options, [plot.xCm1, plot.y] as unknown as uPlot.AlignedData, element);
    chart.current = u;
    const resize = new ResizeObserver(() => u.setSize({ width: element.clientWidth, height: HEIGHT }));
    resize.observe(element);
    return () => {
      resize.disconnect();
      u.destroy();
      chart.current = null;
    };
  }, [plot, technique, xLabel, yLabel, t, language]);

  // A new candidate's bands only need a redraw, not a new chart.
  useEffect(() => {
    chart.current?.redraw(false);
  }, [expectedCm1]);

  const first = plot.xCm1[0] ?? 0;
  const last = plot.xCm1[plot.xCm1.length - 1] ?? 0;

  function view(change: (min: number, max: number) => [number, number]) {
    const u = chart.current;
    if (!u) return;
    const [min, max] = change(u.scales.x!.min!, u.scales.x!.max!);
    const span = max - min;
    // Never pan or zoom past the scan's own range.
    const lo = Math.max(first, Math.min(min, last - span));
    u.setScale('x', { min: lo, max: Math.min(last, lo + span) });
  }
  // On IR's reversed axis "left" means higher wavenumbers.
  const leftSign = technique === 'ir' ? 1 : -1;
  const pan = (direction: number) => view((min, max) => [min + direction * 0.25 * (max - min), max + direction * 0.25 * (max - min)]);

  return (
    <figure className="sb-plot" aria-label={t('identify.plot.figure', { axis: xLabel, count: plot.peaksCm1.length })}>
      <div ref={host} className="sb-plot__canvas" data-testid="spectrum-plot" />
      <figcaption className="sb-plot__caption">
        <span className="sb-plot__key sb-plot__key--peak">{peaksKey}</span>
        {expectedCm1.length > 0 && <span className="sb-plot__key sb-plot__key--expected">{expectedKey}</span>}
        <span className="sb-muted">{t('identify.plot.hint')}</span>
      </figcaption>
      <div className="sb-plot__controls" role="group" aria-label={t('identify.plot.controls')}>
        <IonButton fill="outline" onClick={() => pan(leftSign)}>
          <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
          {t('identify.plot.panLeft')}
        </IonButton>
        <IonButton fill="outline" onClick={() => pan(-leftSign)}>
          {t('identify.plot.panRight')}
          <IonIcon icon={arrowForwardOutline} slot="end" aria-hidden="true" />
        </IonButton>
        <IonButton fill="outline" onClick={() => view((min, max) => [min - 0.5 * (max - min), max + 0.5 * (max - min)])}>
          <IonIcon icon={removeOutline} slot="start" aria-hidden="true" />
          {t('identify.plot.zoomOut')}
        </IonButton>
        <IonButton fill="outline" onClick={() => view(() => [first, last])} data-testid="plot-reset">
          <IonIcon icon={expandOutline} slot="start" aria-hidden="true" />
          {t('identify.plot.reset')}
        </IonButton>
      </div>
    </figure>
  );
}
