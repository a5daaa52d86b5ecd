import { useTranslation } from 'react-i18next';

/** The product mark: the shield-and-trace symbol with the product name beside it. */
export function BrandMark({ size = 36 }: { size?: number }) {
  const { t } = useTranslation();
  return (
    <span className="sb-brand">
      <svg width={size} height={size} viewBox="0 0 512 512" aria-hidden="true" focusable="false">
        <path d="M256 36 L428 96 Q448 103 448 124 L448 252 Q448 384 256 476 Q64 384 64 252 L64 124 Q64 103 84 96 Z" className="sb-brand__shield" />
        <path
          d="M120 318 L168 314 L190 286 L206 318 L236 312 L256 168 L276 312 L300 306 L318 248 L336 310 L392 316"
          fill="none"
          stroke="#f2b134"
          strokeWidth="30"
          strokeLinecap="round"
          strokeLinejoin="round"
        />
      </svg>
      <span className="sb-brand__name">{t('app.name')}</span>
    </span>
  );
}
