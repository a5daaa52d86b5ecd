import { useTranslation } from 'react-i18next';
import type { HazardRank } from '../../features/review/types';
import './review.css';

/** A case's highest hazard in words, never by colour alone. */
export function HazardBadge({ rank }: { rank: HazardRank }) {
  const { t } = useTranslation();
  return (
    <span className={`sb-pill sb-hazard sb-hazard--${rank}`} data-testid="hazard-badge" data-rank={rank}>
      {t(`review.hazard.rank${rank}`)}
    </span>
  );
}
