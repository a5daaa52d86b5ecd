import { cautionCard, type CompoundHazards } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { hazardsFromDraft, type HazardsDraft } from '../../features/library/hazardsDraft';
import { CautionNote } from '../CautionNote';
import { CautionCardView } from '../caution/CautionCardView';

/** The caution card the hazard data being typed would give, as technicians will see it beside a candidate. */
export function HazardsPreview({ value, name }: { value: HazardsDraft; name: string }) {
  const { t } = useTranslation();
  // Every code comes from the shared lists through the selects, so the card can be built as typed;
  // the source is not shown on the card, so a missing one does not block the preview.
  const hazards = { ...hazardsFromDraft(value), source: { ref: value.source.ref, basis: value.source.basis } } as unknown as CompoundHazards;
  const card = cautionCard({ id: 'editor-preview', name: name.trim() || t('library.editor.unnamed'), hazards });
  return (
    <div className="sb-editor-preview" data-testid="caution-preview">
      <h3>{t('library.editor.preview')}</h3>
      <CautionCardView card={card} />
      <CautionNote laser />
    </div>
  );
}
