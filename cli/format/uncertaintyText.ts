/**
 * The text form of an uncertainty study's result (the `uncertainty` verb and
 * `compare --uncertainty`): the inputs and why, the block-fuel band of each
 * design and of B - A, P(B burns less), the drivers, and how long it took.
 */
import type { UncertaintyResult } from '../../engine/uncertainty';
import { formatTable, numberColumns, textColumns } from './textTable';

function kg(x: number): string {
  return x.toFixed(1);
}
function signed(x: number): string {
  return `${x >= 0 ? '+' : ''}${x.toFixed(1)}`;
}
function rho(x: number | null): string {
  return x === null ? '-' : `${x >= 0 ? '+' : ''}${x.toFixed(2)}`;
}

/** The report lines; `elapsed_s` is the wall time the caller measured (null to leave it out). */
export function uncertaintyLines(r: UncertaintyResult, elapsed_s: number | null): string[] {
  const two = r.difference_kg !== null;
  const rows = r.designs.map((d, k) => {
    const s = d.blockFuel_kg;
    return [`${k === 0 ? 'A' : 'B'} "${d.name}"`, kg(s.mean), kg(s.sd), kg(s.p05), kg(s.p50), kg(s.p95), kg(r.deterministic.blockFuel_kg[k]!)];
  });
  if (r.difference_kg !== null) {
    const s = r.difference_kg;
    rows.push(['B - A', signed(s.mean), kg(s.sd), signed(s.p05), signed(s.p50), signed(s.p95), signed(r.deterministic.difference_kg!)]);
  }
  const lines = [
    `Uncertainty — ${r.samplesUsed} of ${r.samples} samples, seed ${r.seed}, ${r.pairing === 'common' ? 'common random numbers for every design' : 'independent samples per design'}`,
    '',
    'Declared uncertain inputs:',
    ...(r.inputs.length === 0 ? ['  (none: the project declares no uncertainty, so the band is the deterministic answer)'] : r.inputs.map((i) => `  ${i.label}: ${i.distribution}${i.reason ? ` — ${i.reason}` : ''}`)),
    '',
    formatTable(
      [...textColumns('block fuel kg'), ...numberColumns('mean', 'sd', 'P5', 'P50', 'P95', 'deterministic')],
      rows,
    ),
  ];
  if (two && r.probabilityBBetter !== null) {
    lines.push('', `P(B burns less block fuel than A) = ${(100 * r.probabilityBBetter).toFixed(1)} % of samples (Monte-Carlo standard error ${(100 * Math.sqrt((r.probabilityBBetter * (1 - r.probabilityBBetter)) / r.samplesUsed)).toFixed(1)} %)`);
  }
  if (r.drivers.length > 0 && r.pairing === 'common') {
    lines.push(
      '',
      `Drivers of ${two ? 'B - A' : 'block fuel'} (Spearman rank correlation; share = rho^2 over the sum of rho^2):`,
      formatTable(
        [...textColumns('input'), ...numberColumns(two ? 'rho(B-A)' : 'rho', 'share', ...r.designs.map((_, k) => `rho(${k === 0 ? 'A' : 'B'})`))],
        r.drivers.map((d) => [d.label, rho(two ? d.rhoDifference : d.rhoDesigns[0]!), d.share === null ? '-' : `${(100 * d.share).toFixed(0)} %`, ...d.rhoDesigns.map(rho)]),
      ),
    );
  }
  if (r.held.length > 0) lines.push('', 'Held at a physical bound:', ...r.held.map((h) => `  ${h.what} (${h.samples} samples)`));
  if (r.failures.count > 0) lines.push('', `${r.failures.count} samples failed and are left out:`, ...r.failures.messages.map((m) => `  ${m}`));
  lines.push(
    '',
    `  Mean standard error: ${r.designs.map((d) => `${d.name} ${kg(d.blockFuel_kg.meanStandardError)} kg`).join(', ')}${r.difference_kg ? `, B - A ${kg(r.difference_kg.meanStandardError)} kg` : ''} (sd/sqrt(n); a Latin hypercube does at least this well).`,
    `  ${r.method}`,
    `  ${r.missions} missions${elapsed_s === null ? '' : ` in ${elapsed_s.toFixed(1)} s`}.`,
  );
  return lines;
}
