import { useId } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { addOutline, trashOutline } from 'ionicons/icons';
import { H_STATEMENTS, HAZARD_CLASSES, PICTOGRAMS, type PictogramCode } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { HAZARD_FLAGS, type HazardsDraft } from '../../features/library/hazardsDraft';
import { HazardsPreview } from './HazardsPreview';
import { SourceField } from './SourceField';

const CLASS_IDS = Object.keys(HAZARD_CLASSES) as (keyof typeof HAZARD_CLASSES)[];
const H_CODES = Object.keys(H_STATEMENTS);
const PICTOGRAM_CODES = Object.keys(PICTOGRAMS) as PictogramCode[];

/** GHS classification, H-statements, pictograms, signal word, UN number and field flags, with the caution card they make. */
export function HazardsEditor({ value, onChange, sources, name }: {
  value: HazardsDraft;
  onChange: (value: HazardsDraft) => void;
  sources: Readonly<Record<string, string>>;
  name: string;
}) {
  const { t } = useTranslation();
  const id = useId();
  const set = (patch: Partial<HazardsDraft>) => onChange({ ...value, ...patch });
  const toggle = <T extends string>(list: readonly T[], item: T, on: boolean): T[] => (on ? [...list, item] : list.filter((x) => x !== item));
  return (
    <section className="sb-panel" aria-labelledby="editor-hazards-heading">
      <h2 id="editor-hazards-heading" className="sb-panel__heading">{t('library.editor.hazards')}</h2>
      <h3>{t('library.detail.classifications')}</h3>
      {value.classifications.map((c, i) => (
        <div key={i} className="sb-editor-inline" data-testid={`classification-${i}`}>
          <div className="sb-field">
            <label htmlFor={`${id}-class-${i}`}>{t('library.editor.hazardClass', { n: i + 1 })}</label>
            <select id={`${id}-class-${i}`} className="sb-native-input" value={c.hazardClass} onChange={(e) => set({ classifications: value.classifications.map((x, j) => (j === i ? { ...x, hazardClass: e.target.value } : x)) })}>
              {CLASS_IDS.map((k) => (
                <option key={k} value={k}>{HAZARD_CLASSES[k].name}</option>
              ))}
            </select>
          </div>
          <div className="sb-field">
            <label htmlFor={`${id}-cat-${i}`}>{t('library.editor.category', { n: i + 1 })}</label>
            <input id={`${id}-cat-${i}`} className="sb-native-input" value={c.category} onChange={(e) => set({ classifications: value.classifications.map((x, j) => (j === i ? { ...x, category: e.target.value } : x)) })} />
          </div>
          <IonButton fill="outline" className="sb-row-action" onClick={() => set({ classifications: value.classifications.filter((_, j) => j !== i) })}>
            <IonIcon icon={trashOutline} slot="start" aria-hidden="true" />
            {t('library.editor.removeClassification', { n: i + 1 })}
          </IonButton>
        </div>
      ))}
      <IonButton fill="outline" className="sb-row-action" onClick={() => set({ classifications: [...value.classifications, { hazardClass: CLASS_IDS[0], category: '' }] })}>
        <IonIcon icon={addOutline} slot="start" aria-hidden="true" />
        {t('library.editor.addClassification')}
      </IonButton>

      <h3>{t('library.editor.hStatements')}</h3>
      {value.hStatements.map((code, i) => (
        <div key={i} className="sb-editor-inline" data-testid={`h-statement-${i}`}>
          <div className="sb-field sb-editor-inline__grow">
            <label htmlFor={`${id}-h-${i}`}>{t('library.editor.hStatement', { n: i + 1 })}</label>
            <select id={`${id}-h-${i}`} className="sb-native-input" value={code} onChange={(e) => set({ hStatements: value.hStatements.map((x, j) => (j === i ? e.target.value : x)) })}>
              {H_CODES.map((k) => (
                <option key={k} value={k}>{`${k} ${H_STATEMENTS[k]}`}</option>
              ))}
            </select>
          </div>
          <IonButton fill="outline" className="sb-row-action" onClick={() => set({ hStatements: value.hStatements.filter((_, j) => j !== i) })}>
            <IonIcon icon={trashOutline} slot="start" aria-hidden="true" />
            {t('library.editor.removeHStatement', { code })}
          </IonButton>
        </div>
      ))}
      <IonButton fill="outline" className="sb-row-action" onClick={() => set({ hStatements: [...value.hStatements, H_CODES.find((k) => !value.hStatements.includes(k)) ?? H_CODES[0]] })}>
        <IonIcon icon={addOutline} slot="start" aria-hidden="true" />
        {t('library.editor.addHStatement')}
      </IonButton>

      <fieldset className="sb-choice">
        <legend>{t('library.editor.pictograms')}</legend>
        <div className="sb-choice__options sb-choice__options--stack">
          {PICTOGRAM_CODES.map((code) => (
            <label key={code} className="sb-choice__option">
              <input type="checkbox" checked={value.pictograms.includes(code)} onChange={(e) => set({ pictograms: toggle(value.pictograms, code, e.target.checked) })} />
              {`${code} ${PICTOGRAMS[code]}`}
            </label>
          ))}
        </div>
      </fieldset>

      <div className="sb-form-grid">
        <div className="sb-field">
          <label htmlFor={`${id}-signal`}>{t('library.editor.signalWord')}</label>
          <select id={`${id}-signal`} className="sb-native-input" value={value.signalWord} onChange={(e) => set({ signalWord: e.target.value as HazardsDraft['signalWord'] })}>
            <option value="">{t('library.editor.signalNone')}</option>
            <option value="Danger">Danger</option>
            <option value="Warning">Warning</option>
          </select>
        </div>
        <div className="sb-field">
          <label htmlFor={`${id}-un`}>{t('library.detail.unNumber')}</label>
          <input id={`${id}-un`} className="sb-native-input" inputMode="numeric" maxLength={4} value={value.unNumber} aria-describedby={`${id}-un-hint`} onChange={(e) => set({ unNumber: e.target.value })} />
          <p id={`${id}-un-hint`} className="sb-muted">{t('library.editor.unHint')}</p>
        </div>
      </div>

      <fieldset className="sb-choice">
        <legend>{t('library.editor.flags')}</legend>
        <div className="sb-choice__options">
          {HAZARD_FLAGS.map((flag) => (
            <label key={flag} className="sb-choice__option">
              <input type="checkbox" checked={value.flags.includes(flag)} onChange={(e) => set({ flags: toggle(value.flags, flag, e.target.checked) })} />
              {t(`library.editor.flag.${flag}`)}
            </label>
          ))}
        </div>
      </fieldset>

      <SourceField legend={t('library.editor.hazardSource')} value={value.source} sources={sources} onChange={(source) => set({ source })} testId="hazard-source" />
      <HazardsPreview value={value} name={name} />
    </section>
  );
}
