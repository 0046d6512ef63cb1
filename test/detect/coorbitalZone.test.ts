import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { PLANETS, RAD_PER_DEG } from '../../src/core/constants.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { loadCatalogue } from '../../src/cli/loadCatalogue.js';
import type { Catalogue } from '../../src/clean/types.js';
import { defaultZoneHalfWidth, screenCoorbitalZone, type ZoneEntry } from '../../src/detect/coorbitalZone.js';
import { predictEntries } from '../../src/detect/coorbitalPredict.js';

const ROOT = resolve(import.meta.dirname, '../..');

describe('co-orbital zone widths', () => {
  it("Earth's zone is the published range of known Earth co-orbitals, 0.983–1.017 au", () => {
    // Kaplan & Cengiz 2020 (MNRAS), abstract: the semimajor axes of all 18 known Earth
    // co-orbitals librate between 0.983 au and 1.017 au.
    expect(defaultZoneHalfWidth('earth')).toBe(0.017);
  });

  it("Jupiter's zone is twice the largest tadpole half-width √(8μ/3) (Murray & Dermott 1999, §3.9)", () => {
    // μ = 1/(1047.3486 + 1) for the Jupiter system (IAU 2009 mass ratio; from memory).
    expect(defaultZoneHalfWidth('jupiter')).toBeCloseTo(2 * Math.sqrt(8 / (3 * 1048.3486)), 5);
  });
});

// Pipeline check on the invented demo catalogue: the generator placed each planted
// co-orbital against the planet's osculating orbit from VSOP87B at the epoch and recorded
// the φ of its written elements (data/demo/coorbital-truth.csv, 6 decimals); the screen must
// find each in its planet's zone at that φ.
describe('co-orbital screen on the demo catalogue', () => {
  let cat: Catalogue;
  let entries: ZoneEntry[];
  let notScreened: Record<string, number>;
  beforeAll(async () => {
    const loaded = await loadCatalogue([join(ROOT, 'data/demo/orbits.txt'), join(ROOT, 'data/demo/comets.txt')]);
    cat = loaded.catalogue;
    ({ entries, notScreened } = screenCoorbitalZone(cat, PLANETS, PLANETS.map(defaultZoneHalfWidth), new Vsop87Ephemeris()));
  });

  it('counts every body once: screened + not screened = catalogue size', () => {
    const not = Object.values(notScreened).reduce((a, b) => a + b, 0);
    expect(entries.length + not).toBe(cat.size);
    expect(notScreened.unbound).toBe(9); // the demo's nine hyperbolic comets (comets.txt, e > 1)
  });

  it('finds every planted co-orbital in its planet\'s zone at the recorded φ', () => {
    const planted = parse(readFileSync(join(ROOT, 'data/demo/coorbital-truth.csv')), { columns: true }) as { designation: string; planet: string; phi_deg: string }[];
    expect(planted.length).toBeGreaterThan(30);
    for (const t of planted) {
      const e = entries.find((x) => cat.designation[x.index] === t.designation);
      expect(e, t.designation).toBeDefined();
      expect(e!.planet, t.designation).toBe(t.planet);
      // the file prints φ with 6 decimals
      expect(Math.abs(e!.phiRad / RAD_PER_DEG - Number(t.phi_deg)), t.designation).toBeLessThan(1e-6);
    }
  });

  it("Jupiter's Trojan swarms: bodies near φ = ±60° with small e and δa are tadpoles on their side", async () => {
    // The restricted three-body problem's triangular points (Murray & Dermott 1999, ch. 3):
    // small-amplitude libration about L4 (+60°) or L5 (−60°). The demo's natural Trojans
    // are invented bodies placed there (data/demo/README.md).
    const jupiter = entries.filter((e) => e.planet === 'jupiter');
    const swarm = jupiter.filter((e) => Math.abs(Math.abs(e.phiRad) - Math.PI / 3) < 20 * RAD_PER_DEG && e.shape.e < 0.1 && Math.abs(e.x) < 0.02);
    expect(swarm.length).toBeGreaterThan(400);
    const predicted = await predictEntries(swarm);
    const wrong = swarm.filter((e, k) => predicted[k].state !== (e.phiRad > 0 ? 'tadpole-L4' : 'tadpole-L5')).map((e) => cat.designation[e.index]);
    expect(wrong).toEqual([]);
  });
});
