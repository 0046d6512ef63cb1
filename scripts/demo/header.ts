/**
 * The short header block at the top of the demo asteroid file, in the project's own words,
 * ending in a dashed line (readers skip everything up to and including that line).
 */
import { DEMO_EPOCH } from './scenario.js';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

export function asteroidFileHeader(seed: number, packedEpoch: string, populationOnly: boolean, checkBody = false): string[] {
  const epoch = `${DEMO_EPOCH.year} ${MONTHS[DEMO_EPOCH.month - 1]} ${DEMO_EPOCH.day}.0 TT`;
  return [
    'wayward demo catalogue - invented minor-body orbits for trying out the screens',
    `Every number, designation and orbit below is invented (generator seed ${seed}); none is a real body.`,
    `All orbits osculate at ${epoch} (packed ${packedEpoch}), J2000 ecliptic and equinox, angles in degrees.`,
    'Blocks: permanently numbered bodies, multi-opposition orbits, one-opposition orbits' +
      (populationOnly ? '.' : `, then older re-submitted orbits${checkBody ? ', then the body whose astrometry is in check/' : ''}.`),
    populationOnly ? 'Natural population only: nothing planted.' : 'What was planted, and where: truth.csv; how to regenerate: README.md.',
    '',
    'packed   H     G   epoch  mean anom  arg peri   asc node   incl       ecc          n (deg/d)   a (au)     U ref       obs  opp arc        rms                    readable',
    '-'.repeat(202),
  ];
}
