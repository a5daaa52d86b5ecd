import { useId, useState } from 'react';
import type { StructureCheck } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { projectPoint } from '../../features/structure/projectAtoms';

const SIZE = 320;
const TILT_DEG = 20;

/** A small orthographic drawing of the molecule in its standard orientation, principal axis upright, turnable with a slider. */
export function MoleculeView({ check }: { check: StructureCheck }) {
  const { t } = useTranslation();
  const id = useId();
  const [turn, setTurn] = useState(30);
  const atoms = check.orientation.atoms;
  const points = atoms.map((a) => projectPoint(a.position as [number, number, number], turn, TILT_DEG));
  const extent = Math.max(1, ...atoms.map((a) => Math.hypot(...a.position))) * 1.25;
  const scale = SIZE / 2 / extent;
  const px = (v: number) => SIZE / 2 + v * scale;
  const radius = Math.max(2.5, Math.min(14, 120 / Math.sqrt(atoms.length + 4)));
  const bonds = check.internalCoordinates?.bonds ?? [];
  const axisTop = projectPoint([0, 0, extent * 0.95], turn, TILT_DEG);
  const axisBottom = projectPoint([0, 0, -extent * 0.95], turn, TILT_DEG);
  const order = points.map((p, i) => ({ p, i })).sort((a, b) => b.p.depth - a.p.depth);
  return (
    <figure className="sb-molecule">
      <svg viewBox={`0 0 ${SIZE} ${SIZE}`} width={SIZE} height={SIZE} role="img" aria-label={t('library.structure.viewLabel', { group: check.pointGroup, atoms: atoms.length })}>
        <line x1={px(axisBottom.x)} y1={px(axisBottom.y)} x2={px(axisTop.x)} y2={px(axisTop.y)} className="sb-molecule__axis" />
        <text x={px(axisTop.x) + 6} y={px(axisTop.y) + 4} className="sb-molecule__axis-label">z</text>
        {bonds.map(([a, b]) => (
          <line key={`${a}-${b}`} x1={px(points[a].x)} y1={px(points[a].y)} x2={px(points[b].x)} y2={px(points[b].y)} className="sb-molecule__bond" />
        ))}
        {order.map(({ p, i }) => (
          <g key={i}>
            <circle cx={px(p.x)} cy={px(p.y)} r={radius} className="sb-molecule__atom" />
            {atoms.length <= 40 && (
              <text x={px(p.x)} y={px(p.y) + 4} textAnchor="middle" className="sb-molecule__element">{atoms[i].element}</text>
            )}
          </g>
        ))}
      </svg>
      <figcaption>
        <label htmlFor={`${id}-turn`}>{t('library.structure.turn')}</label>
        <input id={`${id}-turn`} type="range" min={0} max={360} step={5} value={turn} onChange={(e) => setTurn(Number(e.target.value))} className="sb-molecule__slider" />
        <span className="sb-muted">{t('library.structure.viewHint')}</span>
      </figcaption>
    </figure>
  );
}
