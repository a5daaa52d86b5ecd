// The readable (non-JSON) output of `identify`: peaks, likely compounds with their evidence, cautions.

const fmt = (n, digits = 1) => n.toLocaleString('en', { minimumFractionDigits: digits, maximumFractionDigits: digits, useGrouping: false });

/** Print an identify result as plain text for a person at a terminal. */
export function printIdentifyTable(r) {
  const out = [];
  out.push(`${r.file}: ${r.technique.toUpperCase()} scan, ${r.phase} phase, ${r.peaks.length} peaks`);
  if (!r.reliable) out.push(`NO RELIABLE RESULT: ${r.reasons.join('; ')}`);
  out.push('', 'Likely compounds (band agreement 0-1):');
  for (const c of r.candidates) {
    const card = c.hazards[0];
    const hazard = card?.hazardous ? `  [${card.signalWord ?? 'hazard'}: ${card.pictograms.map((p) => p.code).join(' ')}]` : '';
    out.push(`  ${String(c.rank).padStart(2)}. ${c.name} (CAS ${c.cas})  ${fmt(c.score, 2)}${hazard}${c.listedForCaution ? '  (listed for caution)' : ''}`);
    out.push(`      explained peaks: ${c.explained.map((e) => `${fmt(e.x)}↔${fmt(e.expectedCm1, 0)}${e.label ? ` ${e.label}` : ''}`).join(', ') || 'none'}`);
    if (c.missing.length) out.push(`      missing bands: ${c.missing.map((m) => `${fmt(m.expectedCm1, 0)}${m.label ? ` ${m.label}` : ''}`).join(', ')}`);
    if (c.phaseMismatch) out.push(`      phase fit: ${c.phaseMismatch}`);
    if (c.against.length) out.push(`      evidence against: ${c.against.map((a) => `${fmt(a.x)} (${a.reason})`).join(', ')}`);
  }
  if (r.mixture) {
    const parts = r.mixture.components.map((m) => `${m.name} ${fmt(m.share * 100, 0)} %`).join(' + ');
    out.push('', `Mixture: ${parts} explains ${fmt(r.mixture.explainedShare * 100, 0)} % of the observed intensity (best single ${fmt(r.mixture.bestSingleShare * 100, 0)} %)`);
  }
  if (r.escalation.required) {
    out.push('', 'Escalation to the safety officer:', ...r.escalation.triggers.map((t) => `  - ${t.name}: ${t.reason}`));
  }
  out.push('', 'Cautions:', ...r.cautions.map((c) => `  - ${c}`));
  console.log(out.join('\n'));
}
