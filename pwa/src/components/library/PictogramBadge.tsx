import type { PictogramCode } from '@siteband/shared';

/**
 * Our own simple badge for a GHS pictogram: a red-bordered diamond with the code, and the short
 * description beside it. It names the pictogram; it does not reproduce the official artwork.
 */
export function PictogramBadge({ code, description }: { code: PictogramCode; description: string }) {
  return (
    <li className="sb-pictogram" data-testid={`pictogram-${code}`}>
      <svg viewBox="0 0 64 64" width="56" height="56" aria-hidden="true" focusable="false">
        <rect x="10" y="10" width="44" height="44" transform="rotate(45 32 32)" fill="#ffffff" stroke="#b3121b" strokeWidth="5" />
        <text x="32" y="37" textAnchor="middle" fontSize="13" fontWeight="700" fill="#14202b">
          {code.replace('GHS', '')}
        </text>
      </svg>
      <span>
        <strong>{code}</strong> {description}
      </span>
    </li>
  );
}
