/**
 * What `wayward propagate` prints: a text page for people, or JSON for programs.
 *
 * Dates appear in the scale they were given in (catalogue epochs and dates without a scale
 * are TT) and in TDB, the time of the dynamics; dates the propagation computes (tp) are TDB.
 * JSON keys are plain names; units are never part of a key but stated beside the numbers in
 * a `units` object, and the frame in a `frame` field. Missing numbers are null in JSON.
 */
import type { Instant } from '../core/time/time.js';
import type { PropagateResult } from './propagate.js';

const FRAME = 'heliocentric J2000 ecliptic';

/** `2032-05-10T00:00:00 TT = JD 2463727.500000000 TT = JD 2463727.500000013 TDB` (9 decimals: TDB − TT is ~1e-8 day). */
function dateText(t: Instant): string {
  const given = `${t.toIso(0)} = JD ${t.jd.toFixed(9)} ${t.scale}`;
  return t.scale === 'TDB' ? given : `${given} = JD ${t.to('TDB').jd.toFixed(9)} TDB`;
}

function known(x: number, text: (x: number) => string): string {
  return Number.isFinite(x) ? text(x) : 'unknown';
}

function bodyLines(r: PropagateResult): string[] {
  const b = r.body;
  const lines = [b.quality === null ? `body     ${b.label}` : `body     ${b.label}  (${b.kind}, ${b.source}, found by ${b.matchedBy})`];
  const q = b.quality;
  if (q !== null) {
    lines.push(`quality  U ${known(q.uncertainty, String)}, observations ${known(q.nObs, String)}, `
      + `arc ${known(q.arcDays, (d) => `${Math.round(d)} days`)}; flags: ${q.flags.length > 0 ? q.flags.join(', ') : 'none'}`);
  }
  for (const w of r.warnings) lines.push(`warning: ${w}`);
  return lines;
}

function modelLines(r: PropagateResult): string[] {
  const m = r.model;
  const g = m.nonGravAuPerDay2;
  return [
    `model    ${m.description}${m.steps !== null ? ` (${m.steps} steps)` : ''}`,
    `         non-gravitational forces: ${g === null ? 'none' : `A1 ${g[0]}, A2 ${g[1]}, A3 ${g[2]} au/day²`}`,
    ...r.notes.map((n) => `note: ${n}`),
  ];
}

function textPage(r: PropagateResult): string {
  const f = (x: number, d = 12) => (x >= 0 ? ' ' : '') + x.toFixed(d);
  const p = r.perihelion;
  const lines = [
    ...bodyLines(r),
    ...modelLines(r),
    `from     ${dateText(r.epoch)}`,
    `to       ${dateText(r.target)}`,
    `state at the target date, ${FRAME}`,
    `  x  ${f(r.state[0])} au      vx ${f(r.state[3], 14)} au/day`,
    `  y  ${f(r.state[1])} au      vy ${f(r.state[4], 14)} au/day`,
    `  z  ${f(r.state[2])} au      vz ${f(r.state[5], 14)} au/day`,
    `osculating elements at the target date, ${FRAME}`,
    `  q    ${p.qAu.toFixed(10)} au    e    ${p.e.toFixed(10)}`,
    `  i    ${p.iDeg.toFixed(8)}°    node ${p.nodeDeg.toFixed(8)}°    peri ${p.periDeg.toFixed(8)}°`,
    `  tp   ${dateText(p.tp)}`,
    r.semimajor
      ? `  a    ${r.semimajor.aAu.toFixed(10)} au    M    ${r.semimajor.meanAnomalyDeg.toFixed(8)}°`
      : `  ${r.semimajorAbsentBecause}`,
  ];
  if (r.distances) {
    lines.push('distances at the target date');
    lines.push(`  heliocentric ${r.distances.heliocentricAu.toFixed(10)} au`);
    lines.push(`  geocentric   ${r.distances.geocentricAu.toFixed(10)} au`);
  }
  return lines.join('\n') + '\n';
}

const orNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** A date in the scale it was given in and, when that is not TDB, in TDB too. */
function dateJson(t: Instant): object {
  const given = { scale: t.scale, jd: t.jd, iso: t.toIso(3) };
  if (t.scale === 'TDB') return given;
  const tdb = t.to('TDB');
  return { ...given, tdb: { jd: tdb.jd, iso: tdb.toIso(3) } };
}

function jsonPage(r: PropagateResult): object {
  const b = r.body, q = b.quality, p = r.perihelion, g = r.model.nonGravAuPerDay2;
  return {
    body: {
      label: b.label, designation: b.designation, name: b.name, kind: b.kind, source: b.source, matchedBy: b.matchedBy,
      quality: q === null ? null : {
        flags: q.flags, poorOrbit: q.poor, unknown: q.unknown,
        uncertainty: orNull(q.uncertainty), observations: orNull(q.nObs), arc: orNull(q.arcDays), units: { arc: 'days' },
      },
    },
    model: {
      description: r.model.description, planets: r.model.planets, relativity: r.model.relativity,
      nonGravitational: g === null ? null : { A1: g[0], A2: g[1], A3: g[2], law: 'water-ice', units: { A1: 'au/day^2', A2: 'au/day^2', A3: 'au/day^2' } },
      integratorSteps: r.model.steps,
    },
    epoch: dateJson(r.epoch),
    target: dateJson(r.target),
    state: {
      frame: FRAME, units: { position: 'au', velocity: 'au/day' },
      position: { x: r.state[0], y: r.state[1], z: r.state[2] },
      velocity: { x: r.state[3], y: r.state[4], z: r.state[5] },
    },
    elements: {
      frame: FRAME, units: { q: 'au', a: 'au', i: 'deg', node: 'deg', peri: 'deg', M: 'deg' },
      q: p.qAu, e: p.e, i: p.iDeg, node: p.nodeDeg, peri: p.periDeg, tp: dateJson(p.tp),
      a: r.semimajor ? r.semimajor.aAu : null, M: r.semimajor ? r.semimajor.meanAnomalyDeg : null,
      aAndMAbsentBecause: r.semimajor ? null : r.semimajorAbsentBecause,
    },
    distances: r.distances === null ? null : {
      units: { heliocentric: 'au', geocentric: 'au' },
      heliocentric: r.distances.heliocentricAu, geocentric: r.distances.geocentricAu,
    },
    notes: r.notes,
    warnings: r.warnings,
  };
}

/** The text (or JSON) the command prints. */
export function formatPropagation(r: PropagateResult, format: 'text' | 'json'): string {
  return format === 'json' ? JSON.stringify(jsonPage(r), null, 2) + '\n' : textPage(r);
}
