import { IonButton, IonIcon } from '@ionic/react';
import { addOutline, trashOutline } from 'ionicons/icons';
import type { BandIntensity, StructureCheck } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { BAND_INTENSITIES } from '../../features/library/bandDraft';
import { blankFundamental, PHASES, type FundamentalDraft } from '../../features/library/compoundDraft';

type Mode = StructureCheck['vibrations']['modes'][number];
type Technique = 'ir' | 'raman';

/**
 * The fundamentals as an editable table: mode, symmetry label, position per phase, IR and Raman
 * intensity, assignment. An intensity can be given only where the structure check finds the
 * species active: activity is the engine's answer, never typed.
 */
export function FundamentalsEditor({ rows, onChange, modes, pointGroup }: {
  rows: readonly FundamentalDraft[];
  onChange: (rows: FundamentalDraft[]) => void;
  modes: readonly Mode[] | undefined;
  pointGroup: string | undefined;
}) {
  const { t } = useTranslation();
  const byLabel = new Map((modes ?? []).map((m) => [m.label, m]));
  const set = (i: number, patch: Partial<FundamentalDraft>) => onChange(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const technique = (row: FundamentalDraft, i: number, tech: Technique) => {
    const mode = byLabel.get(row.label.trim());
    const name = t(`library.editor.technique.${tech}`);
    // Unknown until the check has run or when the label is not a species: left editable, the Γvib check names the problem.
    const inactive = mode !== undefined && !mode[tech];
    const hintId = `fundamental-${i}-${tech}-hint`;
    return (
      <td>
        <select
          className="sb-native-input"
          aria-label={t('library.editor.intensityOf', { mode: row.mode, technique: name })}
          aria-describedby={inactive ? hintId : undefined}
          disabled={inactive && row[tech] === ''}
          value={row[tech]}
          onChange={(e) => set(i, { [tech]: e.target.value as BandIntensity | '' })}
        >
          <option value="">{t('library.editor.intensityNone')}</option>
          {BAND_INTENSITIES.map((v) => (
            <option key={v} value={v}>{t(`library.editor.intensity.${v}`)}</option>
          ))}
        </select>
        {inactive && (
          <p id={hintId} className="sb-muted" data-testid={`inactive-${row.mode}-${tech}`}>
            {t('library.editor.inactiveIn', { technique: name, group: pointGroup })}
          </p>
        )}
      </td>
    );
  };
  return (
    <>
      <div className="sb-table-wrap">
        <table className="sb-table sb-editor-fundamentals">
          <caption>{t('library.editor.fundamentals')}</caption>
          <thead>
            <tr>
              <th scope="col">{t('library.detail.colMode')}</th>
              <th scope="col">{t('library.detail.colLabel')}</th>
              {PHASES.map((p) => (
                <th key={p} scope="col">{t(`library.detail.col${p[0].toUpperCase()}${p.slice(1)}`)}</th>
              ))}
              <th scope="col">{t('library.editor.technique.ir')}</th>
              <th scope="col">{t('library.editor.technique.raman')}</th>
              <th scope="col">{t('library.detail.colAssignment')}</th>
              <th scope="col">{t('library.editor.colRemove')}</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row, i) => (
              <tr key={i}>
                <td>
                  <input className="sb-native-input" aria-label={t('library.editor.modeOf', { n: i + 1 })} value={row.mode} onChange={(e) => set(i, { mode: e.target.value })} />
                </td>
                <td>
                  <input className="sb-native-input" aria-label={t('library.editor.labelOf', { mode: row.mode })} value={row.label} onChange={(e) => set(i, { label: e.target.value })} />
                </td>
                {PHASES.map((p) => (
                  <td key={p}>
                    <input
                      className="sb-native-input"
                      inputMode="decimal"
                      aria-label={t('library.editor.positionOf', { mode: row.mode, phase: t(`library.phase.${p}`) })}
                      value={row.cm1[p]}
                      onChange={(e) => set(i, { cm1: { ...row.cm1, [p]: e.target.value } })}
                    />
                  </td>
                ))}
                {technique(row, i, 'ir')}
                {technique(row, i, 'raman')}
                <td>
                  <input className="sb-native-input" aria-label={t('library.editor.assignmentOf', { mode: row.mode })} value={row.assignment} onChange={(e) => set(i, { assignment: e.target.value })} />
                </td>
                <td>
                  <IonButton fill="outline" className="sb-row-action" aria-label={t('library.editor.removeFundamental', { mode: row.mode })} onClick={() => onChange(rows.filter((_, j) => j !== i))}>
                    <IonIcon icon={trashOutline} slot="icon-only" aria-hidden="true" />
                  </IonButton>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <IonButton fill="outline" className="sb-row-action" onClick={() => onChange([...rows, blankFundamental(rows.length)])}>
        <IonIcon icon={addOutline} slot="start" aria-hidden="true" />
        {t('library.editor.addFundamental')}
      </IonButton>
    </>
  );
}
