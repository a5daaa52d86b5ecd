// The readable (non-JSON) output of `symmetry`: group, elements, Γvib and the activity table.


/** `E, C3, 3σv`: each element label once, with how often it occurs. */
function countLabels(elements) {
  const counts = new Map();
  for (const e of elements) counts.set(e.label, (counts.get(e.label) ?? 0) + 1);
  return [...counts].map(([label, n]) => `${n > 1 ? n : ''}${label}`).join(', ');
}

/** Print a structure check as plain text for a person at a terminal. */
export function printSymmetryTable(c) {
  const v = c.vibrations;
  const gamma = v.modes.map((m) => `${m.count > 1 ? m.count : ''}${m.display}`).join(' + ');
  const rows = v.modes.map((m) => [
    m.display,
    String(m.count),
    String(m.degeneracy),
    m.ir ? `yes (${m.irComponents.join(', ')})` : '-',
    m.raman ? `yes (${m.ramanComponents.join(', ')})` : '-',
    m.composition ?? '',
    m.band ? `${m.band.type}, ${m.band.branches.join('/')}` : '',
  ]);
  const head = ['species', 'count', 'degeneracy', 'IR', 'Raman', 'internal coordinates', 'gas band'];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
  const line = (r) => r.map((cell, i) => cell.padEnd(widths[i])).join('  ').trimEnd();

  const out = [
    `${c.title ? `${c.title}\n` : ''}${c.formula}: ${c.atoms} atoms, point group ${c.pointGroup}${c.order ? ` (order ${c.order})` : ''}, ${c.top ?? c.topType}`,
    `symmetry elements: ${countLabels(c.elements)}`,
    `Γvib = ${gamma}   (${v.total} vibrational degrees of freedom, ${v.fundamentals} distinct fundamentals)`,
    `IR-active ${v.irActive}, Raman-active ${v.ramanActive}, both ${v.coincident}, silent ${v.silent}${v.mutualExclusion ? '; centrosymmetric: rule of mutual exclusion' : ''}`,
    '',
    line(head),
    line(widths.map((w) => '-'.repeat(w))),
    ...rows.map(line),
    '',
    ...[...v.notes, ...c.cautions].map((n) => `note: ${n}`),
  ];
  console.log(out.join('\n'));
}
