import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import type { Phase, Technique } from '@siteband/shared';
import { COMMON_EXCITATIONS_NM, type ScanSettings } from '../../features/identify/scanSettings';
import './scan-form.css';

export interface ScanSettingsFormProps {
  readonly value: ScanSettings;
  readonly onChange: (next: ScanSettings) => void;
}

function Choice<T extends string>({ legend, name, options, value, onChange }: {
  legend: string;
  name: string;
  options: readonly { value: T; label: string }[];
  value: T;
  onChange: (value: T) => void;
}) {
  return (
    <fieldset className="sb-choice">
      <legend>{legend}</legend>
      <div className="sb-choice__options">
        {options.map((o) => (
          <label key={o.value} className="sb-choice__option">
            <input type="radio" name={name} value={o.value} checked={value === o.value} onChange={() => onChange(o.value)} />
            <span>{o.label}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** How the scan was taken: technique, phase, ATR (IR) or laser wavelength (Raman). */
export function ScanSettingsForm({ value, onChange }: ScanSettingsFormProps) {
  const { t } = useTranslation();
  const otherId = useId();
  const set = (patch: Partial<ScanSettings>) => onChange({ ...value, ...patch });
  const common = (COMMON_EXCITATIONS_NM as readonly number[]).includes(value.excitationNm);
  const excitation = common ? String(value.excitationNm) : 'other';
  return (
    <div className="sb-scan-settings">
      <Choice<Technique>
        legend={t('identify.settings.technique')}
        name="technique"
        value={value.technique}
        options={[
          { value: 'ir', label: t('identify.settings.ir') },
          { value: 'raman', label: t('identify.settings.raman') },
        ]}
        onChange={(technique) => set({ technique })}
      />
      <Choice<Phase>
        legend={t('identify.settings.phase')}
        name="phase"
        value={value.phase}
        options={[
          { value: 'condensed', label: t('identify.settings.condensed') },
          { value: 'gas', label: t('identify.settings.gas') },
        ]}
        onChange={(phase) => set({ phase })}
      />
      {value.technique === 'ir' ? (
        <Choice<'yes' | 'no'>
          legend={t('identify.settings.atr')}
          name="atr"
          value={value.atr ? 'yes' : 'no'}
          options={[
            { value: 'yes', label: t('identify.settings.atrYes') },
            { value: 'no', label: t('identify.settings.atrNo') },
          ]}
          onChange={(atr) => set({ atr: atr === 'yes' })}
        />
      ) : (
        <div>
          <Choice<string>
            legend={t('identify.settings.excitation')}
            name="excitation"
            value={excitation}
            options={[
              ...COMMON_EXCITATIONS_NM.map((nm) => ({ value: String(nm), label: t('identify.settings.nm', { nm }) })),
              { value: 'other', label: t('identify.settings.otherNm') },
            ]}
            onChange={(choice) => set({ excitationNm: choice === 'other' ? 532 : Number(choice) })}
          />
          {!common && (
            <div className="sb-field">
              <label htmlFor={otherId}>{t('identify.settings.otherNmLabel')}</label>
              <input
                id={otherId}
                className="sb-select sb-number"
                type="number"
                inputMode="decimal"
                min={200}
                max={2000}
                step="any"
                value={Number.isFinite(value.excitationNm) ? value.excitationNm : ''}
                onChange={(e) => set({ excitationNm: e.target.value === '' ? Number.NaN : Number(e.target.value) })}
              />
            </div>
          )}
        </div>
      )}
    </div>
  );
}
