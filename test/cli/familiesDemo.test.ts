// The families detector on the bundled demo catalogue against the generator's planting record
// (data/demo/families-truth.csv: invented data, scripts/demo/). What is checked and where its
// yardstick comes from:
// - every planted family found: one found family holds most of its members, and no found family
//   holds members of two planted families (the planting record);
// - every planted isolated body flagged with false-alarm probability below the default 0.01, and by scan
//   (Benjamini–Hochberg q below 0.05); each sits at the centre of an empty pocket of the background;
// - the background's false alarms: under a calibrated null model the fraction of background bodies
//   below α is α within its binomial uncertainty, ±3σ with σ = √(α(1−α)/N) (common practice for a
//   binomial proportion); the count by proper a is printed, since sharp density steps (the holes
//   the stage leaves where it sets bodies apart) are where a misfit would show.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import { ROOT, runCli, tempDir } from './cliHarness.js';

type Row = Record<string, string>;
const table = (path: string): Row[] => parse(readFileSync(path), { columns: true }) as Row[];
const truth = table(join(ROOT, 'data/demo/families-truth.csv'));
const ORBITS = 'data/demo/orbits.txt';

const out01 = tempDir(), out05 = tempDir(), scanOut = tempDir();
let members: Row[] = [];

beforeAll(() => {
  for (const [out, extra] of [[out01, []], [out05, ['--fap', '0.05']]] as const) {
    const r = runCli(['families', ORBITS, ...extra, '--out', out]);
    expect(r.status, r.stderr).toBe(0);
  }
  members = table(join(out01, 'members.csv'));
}, 240_000);

describe('families on the demo: the planted families', () => {
  it('finds every planted family: one found family holds most of its members, none mixes two plants', () => {
    const plant = new Map(truth.filter((t) => t.role === 'family member').map((t) => [t.designation, t.family]));
    const planted = [...new Set(plant.values())].sort();
    expect(planted.length).toBeGreaterThanOrEqual(4);
    const foundOf = new Map(members.map((m) => [m.designation, m.family_id]));
    const lines: string[] = [];
    for (const id of planted) {
      const mine = [...plant].filter(([, f]) => f === id).map(([d]) => d);
      const counts = new Map<string, number>();
      for (const d of mine) {
        const f = foundOf.get(d);
        if (f) counts.set(f, (counts.get(f) ?? 0) + 1);
      }
      const [best, held] = [...counts].sort((x, y) => y[1] - x[1])[0] ?? ['none', 0];
      lines.push(`planted ${id}: ${mine.length} members, ${held} (${((100 * held) / mine.length).toFixed(1)} %) in ${best}`);
      expect(held / mine.length, `planted family ${id}`).toBeGreaterThan(0.8);
    }
    // no found family holds members of two planted families
    const plantsIn = new Map<string, Set<string>>();
    for (const m of members) {
      const p = plant.get(m.designation);
      if (p) plantsIn.set(m.family_id, (plantsIn.get(m.family_id) ?? new Set()).add(p));
    }
    for (const [f, ps] of plantsIn) expect([...ps], f).toHaveLength(1);
    const background = new Set(truth.filter((t) => t.role === 'background').map((t) => t.designation));
    const foundIds = [...new Set(members.map((m) => m.family_id))];
    lines.push(`${foundIds.length} families found; background bodies taken into them: ${members.filter((m) => background.has(m.designation)).length}`);
    console.log(lines.join('\n'));
  });

  it('names none of them after a published family (the demo\'s families are invented, placed where no published family is)', () => {
    for (const f of table(join(out01, 'families.csv'))) expect(f.named_by, f.id).toBe('none');
  });
});

describe('families on the demo: isolated bodies and the background', () => {
  it('flags every planted isolated body with false-alarm probability below 0.01', () => {
    const outliers = new Map(table(join(out01, 'outliers.csv')).map((o) => [o.designation, o]));
    const planted = truth.filter((t) => t.role === 'outlier');
    expect(planted.length).toBeGreaterThanOrEqual(6);
    expect(planted.length).toBeLessThanOrEqual(20);
    const faps = planted.map((t) => Number(outliers.get(t.designation)?.false_alarm_prob ?? NaN));
    console.log(`planted isolated bodies: ${planted.length}, false-alarm probabilities ${faps.map((x) => x.toPrecision(2)).join(', ')}`);
    for (const [k, t] of planted.entries()) expect(faps[k], t.designation).toBeLessThan(0.01);
    // placed at the centre of an empty pocket, the nearest drawn body at least 0.9 of its radius away
    // (scripts/demo/plantedOutliers.ts): the stage's own nearest body agrees within the short-period scatter
    for (const t of planted) {
      expect(Number(outliers.get(t.designation)!.nearest_body_mps), t.designation).toBeGreaterThan(0.9 * Number(t.pocket_radius_mps) - 30);
    }
  });

  it('puts a fraction of the background below α = 0.01 and 0.05 within 3σ of α (binomial)', () => {
    const pockets = truth.filter((t) => t.role === 'outlier');
    // within 1.5 pocket radii of a pocket's centre, in the families metric (velocity at the centre's a, Zappalà et al. 1990)
    const onRim = (t: Row): boolean => pockets.some((p) => {
      const a = Number(p.a_proper_au), v = orbitalSpeedMPerS(a);
      const d = v * Math.hypot(Math.sqrt(1.25) * Math.log(Number(t.a_proper_au) / a), Math.SQRT2 * (Number(t.e_proper) - Number(p.e_proper)),
        Math.SQRT2 * (Number(t.sin_i_proper) - Number(p.sin_i_proper)));
      return d < 1.5 * Number(p.pocket_radius_mps);
    });
    const notTested = new Set([
      ...table(join(out01, 'unreliable.csv')).map((r) => r.designation),
      ...table(join(out01, 'not-screened.csv')).map((r) => r.designation),
      ...members.map((m) => m.designation),
    ]);
    const background = truth.filter((t) => t.role === 'background' && !notTested.has(t.designation));
    const n = background.length;
    expect(n).toBeGreaterThan(5000);
    for (const [alpha, out] of [[0.01, out01], [0.05, out05]] as const) {
      const fap = new Map(table(join(out, 'outliers.csv')).map((o) => [o.designation, Number(o.false_alarm_prob)]));
      const flagged = background.filter((t) => (fap.get(t.designation) ?? 1) < alpha);
      const fraction = flagged.length / n, sigma = Math.sqrt((alpha * (1 - alpha)) / n);
      const bins = new Map<number, [number, number]>();
      const bin = (t: Row): number => Math.floor(Number(t.a_proper_au) / 0.1) / 10;
      for (const t of background) bins.set(bin(t), [(bins.get(bin(t)) ?? [0, 0])[0], (bins.get(bin(t)) ?? [0, 0])[1] + 1]);
      for (const t of flagged) bins.get(bin(t))![0]++;
      const rimFlagged = flagged.filter(onRim).length, rimAll = background.filter(onRim).length;
      const hist = [...bins].sort((x, y) => x[0] - y[0]).map(([a, [f, all]]) => `${a.toFixed(1)}: ${f}/${all}`).join(', ');
      console.log(`α = ${alpha}: ${flagged.length} of ${n} background bodies tested, fraction ${(100 * fraction).toFixed(2)} % ` +
        `(σ ${(100 * sigma).toFixed(2)} %, ${((fraction - alpha) / sigma).toFixed(2)}σ from α); on the pockets' rims (within 1.5 radii) ` +
        `${rimFlagged} of ${rimAll}; by proper a (au, flagged/tested): ${hist}`);
      expect(Math.abs(fraction - alpha)).toBeLessThan(3 * sigma);
    }
  });

  it('writes families-truth.csv rows that name the designation written at their line of orbits.txt', () => {
    const lines = readFileSync(join(ROOT, ORBITS), 'latin1').split('\n');
    for (const t of truth) expect(lines[Number(t.line) - 1].includes(` ${t.designation} `) || lines[Number(t.line) - 1].includes(`${t.designation} `), `${t.designation} at ${t.line}`).toBe(true);
  });
});

describe('scan with tisserand, coorbital and families on the demo', () => {
  it('raises every planted isolated body as a family-outlier with false-alarm probability below 0.01', () => {
    const r = runCli(['scan', ORBITS, '--detectors', 'tisserand,coorbital,families', '--reproducible', '--out', scanOut]);
    expect(r.status, r.stderr).toBe(0);
    const raw = readFileSync(join(scanOut, 'candidates.jsonl'), 'utf8').trim().split('\n').map((l) => JSON.parse(l));
    const fam = new Map(raw.filter((c) => c.detector === 'families').map((c) => [c.designation, c]));
    for (const t of truth.filter((x) => x.role === 'outlier')) {
      const c = fam.get(t.designation);
      expect(c?.class, t.designation).toBe('family-outlier');
      expect(c.falseAlarmProb, t.designation).toBeLessThan(0.01);
    }
    // the same analysis as the families command: scan's candidates are its outliers with q below 0.05
    const passing = table(join(out01, 'outliers.csv')).filter((o) => o.fdr_pass === 'yes');
    expect([...fam.keys()].sort()).toEqual(passing.map((o) => o.designation).sort());
    const role = new Map(truth.map((t) => [t.designation, t.role]));
    console.log(`scan's family-outlier candidates: ${fam.size}; not planted isolated bodies: ` +
      (passing.filter((o) => role.get(o.designation) !== 'outlier').map((o) => `${o.designation} (${role.get(o.designation) || 'not planted in proper elements'}, a ${o.proper_a_au}, e ${o.proper_e}, sin i ${o.proper_sin_i}, q ${o.q_value})`).join('; ') || 'none'));
  }, 300_000);
});
