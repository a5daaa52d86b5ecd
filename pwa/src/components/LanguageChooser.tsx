import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import { changeLanguage, SUPPORTED_LANGUAGES, type Language } from '../i18n';
import { languageName } from '../i18n/format';

/** Picks the interface language among the bundled ones, each named in its own language. */
export function LanguageChooser() {
  const { t, i18n } = useTranslation();
  const id = useId();
  return (
    <div className="sb-field">
      <label htmlFor={id}>{t('pages.account.language')}</label>
      <select
        id={id}
        className="sb-select"
        value={i18n.language}
        onChange={(event) => void changeLanguage(event.target.value as Language)}
      >
        {SUPPORTED_LANGUAGES.map((lang) => (
          <option key={lang} value={lang}>
            {languageName(lang)}
          </option>
        ))}
      </select>
    </div>
  );
}
