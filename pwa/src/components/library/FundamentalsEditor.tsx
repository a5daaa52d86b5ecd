import type { MatterPhase } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import type { FundamentalDraft } from '../../features/library/compoundDraft';

const PHASES: readonly MatterPhase[] = ['gas', 'liquid', 'solid'];

/** The fundamentals as an editable table: mode, symmetry label, position per phase, assignment. */
export function FundamentalsEditor({ rows, onChange }: { rows: readonly FundamentalDraft[]; onChange: (rows: FundamentalDraft[]) => void }) {
  const { t } = useTranslation();
  const set = (i: number, patch: Partial<FundamentalDraft>) => onChange(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  return (
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
            <th scope="col">{t('library.detail.colAssignment')}</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => (
            <tr key={i}>
              <th scope="row">{row.mode}</th>
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
              <td>
                <input className="sb-native-input" aria-label={t('library.editor.assignmentOf', { mode: row.mode })} value={row.assignment} onChange={(e) => set(i, { assignment: e.target.value })} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
