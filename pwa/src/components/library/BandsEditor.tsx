import { useId } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { addOutline, trashOutline } from 'ionicons/icons';
import { BAND_RANGE_CM1, type BandIntensity, type MatterPhase, type Technique } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { BAND_INTENSITIES, blankBand, type BandDraft } from '../../features/library/bandDraft';
import { PHASES, type CompoundDraft } from '../../features/library/compoundDraft';
import { formatNumber } from '../../features/structure/formatNumber';
import { SourceField } from './SourceField';

const TECHNIQUES: readonly Technique[] = ['ir', 'raman'];

/** One band's fields; numbers typed as text so validation can name a band that is not a number. */
function BandRow({ band, index, sources, onChange, onRemove }: {
  band: BandDraft;
  index: number;
  sources: Readonly<Record<string, string>>;
  onChange: (band: BandDraft) => void;
  onRemove: () => void;
}) {
  const { t, i18n } = useTranslation();
  const id = useId();
  const n = index + 1;
  const select = <T extends string>(key: 'technique' | 'phase' | 'intensity', label: string, options: readonly T[], name: (o: T) => string) => (
    <div className="sb-field">
      <label htmlFor={`${id}-${key}`}>{label}</label>
      <select id={`${id}-${key}`} className="sb-native-input" value={band[key]} onChange={(e) => onChange({ ...band, [key]: e.target.value })}>
        {options.map((o) => (
          <option key={o} value={o}>{name(o)}</option>
        ))}
      </select>
    </div>
  );
  const text = (key: 'cm1' | 'widthCm1' | 'assignment' | 'label', label: string, numeric = false, hint?: string) => (
    <div className="sb-field">
      <label htmlFor={`${id}-${key}`}>{label}</label>
      <input
        id={`${id}-${key}`}
        className="sb-native-input"
        inputMode={numeric ? 'decimal' : undefined}
        value={band[key]}
        aria-describedby={hint ? `${id}-${key}-hint` : undefined}
        onChange={(e) => onChange({ ...band, [key]: e.target.value })}
      />
      {hint && <p id={`${id}-${key}-hint`} className="sb-muted">{hint}</p>}
    </div>
  );
  const range = { min: formatNumber(BAND_RANGE_CM1.min, i18n.language), max: formatNumber(BAND_RANGE_CM1.max, i18n.language) };
  return (
    <fieldset className="sb-editor-row" data-testid={`band-${index}`}>
      <legend>{t('library.editor.bandN', { n })}</legend>
      <div className="sb-form-grid">
        {select<Technique>('technique', t('library.detail.colTechnique'), TECHNIQUES, (o) => t(`library.editor.technique.${o}`))}
        {text('cm1', t('library.editor.bandPosition'), true, t('library.editor.bandRange', range))}
        {select<MatterPhase>('phase', t('library.detail.colPhase'), PHASES, (o) => t(`library.phase.${o}`))}
        {select<BandIntensity>('intensity', t('library.detail.colIntensity'), BAND_INTENSITIES, (o) => t(`library.editor.intensity.${o}`))}
        {text('widthCm1', t('library.editor.bandWidth'), true)}
        {text('label', t('library.editor.bandLabel'))}
        <div className="sb-form-grid__wide">{text('assignment', t('library.detail.colAssignment'))}</div>
        <div className="sb-form-grid__wide">
          <SourceField legend={t('library.editor.bandSource', { n })} value={band.source} sources={sources} noneLabel={t('library.editor.bandSourceDefault')} onChange={(source) => onChange({ ...band, source })} />
        </div>
      </div>
      <IonButton fill="outline" className="sb-row-action" onClick={onRemove}>
        <IonIcon icon={trashOutline} slot="start" aria-hidden="true" />
        {t('library.editor.removeBand', { n })}
      </IonButton>
    </fieldset>
  );
}

/** The characteristic bands: one source for all of them, and each band with its own fields. */
export function BandsEditor({ draft, onChange, sources }: { draft: CompoundDraft; onChange: (draft: CompoundDraft) => void; sources: Readonly<Record<string, string>> }) {
  const { t } = useTranslation();
  const setBands = (bands: BandDraft[]) => onChange({ ...draft, bands });
  return (
    <section className="sb-panel" aria-labelledby="editor-bands-heading">
      <h2 id="editor-bands-heading" className="sb-panel__heading">{t('library.detail.bands')}</h2>
      <p className="sb-muted">{t('library.editor.bandsHint')}</p>
      <SourceField legend={t('library.editor.bandsSource')} value={draft.bandsSource} sources={sources} onChange={(bandsSource) => onChange({ ...draft, bandsSource })} testId="bands-source" />
      {draft.bands.map((band, i) => (
        <BandRow
          key={i}
          band={band}
          index={i}
          sources={sources}
          onChange={(next) => setBands(draft.bands.map((b, j) => (j === i ? next : b)))}
          onRemove={() => setBands(draft.bands.filter((_, j) => j !== i))}
        />
      ))}
      <IonButton fill="outline" className="sb-row-action" onClick={() => setBands([...draft.bands, blankBand(draft.phases[0] ?? 'liquid')])}>
        <IonIcon icon={addOutline} slot="start" aria-hidden="true" />
        {t('library.editor.addBand')}
      </IonButton>
    </section>
  );
}
