import { useTranslation } from 'react-i18next';
import { THEME_PREFERENCES, useThemePreference, type ThemePreference } from '../features/preferences/themePreference';

const LABEL_KEYS: Readonly<Record<ThemePreference, string>> = {
  system: 'pages.account.themeSystem',
  light: 'pages.account.themeLight',
  dark: 'pages.account.themeDark',
};

/** Large radio choices for the colour scheme: follow the tablet, light or dark. */
export function ThemeChooser() {
  const { t } = useTranslation();
  const [preference, setPreference] = useThemePreference();
  return (
    <fieldset className="sb-choice">
      <legend>{t('pages.account.theme')}</legend>
      <div className="sb-choice__options">
        {THEME_PREFERENCES.map((option) => (
          <label key={option} className="sb-choice__option">
            <input
              type="radio"
              name="theme"
              value={option}
              checked={preference === option}
              onChange={() => setPreference(option)}
            />
            <span>{t(LABEL_KEYS[option])}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
