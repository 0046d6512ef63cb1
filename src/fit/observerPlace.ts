/**
 * The observer of an astrometric observation as the observation model needs it: a fixed site
 * from the observatory-code table, the roving site or the space-based position the record
 * gives. Observations go through checkStations (src/io/astrometry/observationStations.ts)
 * first, so a fixed site is known; a missing one here is caller misuse.
 */
import type { AstrometryObservation, ObservatorySite } from '../io/astrometry/types.js';
import type { ObserverPlace } from './types.js';

/** The observer of `obs`; TypeError when its station has no fixed site in `sites` or its own position is missing. */
export function observerPlaceOf(obs: AstrometryObservation, sites: ReadonlyMap<string, ObservatorySite>): ObserverPlace {
  if (obs.kind === 'space') {
    if (obs.observerGeocentricKm === null) throw new TypeError(`observerPlaceOf: space-based observation at ${obs.file}:${obs.line} has no observer position`);
    return { kind: 'space', geocentricKm: obs.observerGeocentricKm };
  }
  if (obs.kind === 'roving') {
    if (obs.rovingSite === null) throw new TypeError(`observerPlaceOf: roving observation at ${obs.file}:${obs.line} has no site`);
    const r = obs.rovingSite;
    return { kind: 'geodetic', longitudeDegE: r.longitudeDegE, latitudeDeg: r.latitudeDeg, altitudeM: r.altitudeM };
  }
  const site = sites.get(obs.station);
  if (site === undefined || !site.fixedSite) {
    throw new TypeError(`observerPlaceOf: station ${obs.station} of ${obs.file}:${obs.line} has no fixed site; run checkStations first`);
  }
  return { kind: 'site', longitudeDegE: site.longitudeDegE, rhoCosPhiPrime: site.rhoCosPhiPrime, rhoSinPhiPrime: site.rhoSinPhiPrime };
}
