import type { PictogramCode } from '@siteband/shared';

/**
 * A GHS pictogram as our own plain badge: a red-bordered diamond with the code, and the short
 * description beside it. The official artwork is not reproduced; the words carry the meaning.
 */
export function PictogramBadge({ code, description }: { code: PictogramCode; description: string }) {
  return (
    <li className="sb-pictogram">
      <span className="sb-pictogram__diamond" aria-hidden="true">
        <span>{code.replace('GHS', '')}</span>
      </span>
      <span className="sb-pictogram__text">
        <strong>{code}</strong> {description}
      </span>
    </li>
  );
}
