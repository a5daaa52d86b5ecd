import { describe, expect, it } from 'vitest';
import { initI18n } from './index';

describe('the sign-in intro', () => {
  it('states the offline period with the plural form its number of hours takes', async () => {
    const i18n = await initI18n();
    expect(i18n.t('signIn.intro', { count: 72 })).toMatch(/without a connection for 72 hours\.$/);
    expect(i18n.t('signIn.intro', { count: 1 })).toMatch(/without a connection for 1 hour\.$/);
  });
});
