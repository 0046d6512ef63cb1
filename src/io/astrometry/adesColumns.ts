/**
 * Column names of the pipe-separated (PSV) form of the IAU Astrometry Data Exchange Standard
 * (ADES), optical observations. Field names and meanings: ADES Description, version 2017
 * (IAU Commission 20 / Minor Planet Center), from memory: permID (permanent designation:
 * number or periodic comet), provID (provisional designation, unpacked), trkSub (observer's
 * tracklet id), obsTime (ISO 8601 UTC), ra, dec (degrees, J2000), rmsRA (arcsec, of
 * RA × cos δ), rmsDec (arcsec), rmsCorr (correlation), stn (observatory code), mode
 * (CCD, PHO, …), astCat (reference catalogue), mag, band; for observers not at a fixed
 * site sys (coordinate system), ctr (origin body, 399 = Earth), pos1..pos3.
 * Names are matched as the standard spells them, and also in any letter case ('permId').
 * Unknown columns are ignored.
 */

export const ADES_FIELDS = [
  'permID', 'provID', 'trkSub', 'obsTime', 'ra', 'dec', 'rmsRA', 'rmsDec', 'rmsCorr',
  'stn', 'mode', 'astCat', 'mag', 'band', 'sys', 'ctr', 'pos1', 'pos2', 'pos3',
] as const;

export type AdesField = (typeof ADES_FIELDS)[number];

/** Fields without which an optical observation cannot be read. */
export const ADES_REQUIRED: readonly AdesField[] = ['obsTime', 'ra', 'dec', 'stn'];
/** At least one of these must be a column: the body's identity. */
export const ADES_IDENTITY: readonly AdesField[] = ['permID', 'provID', 'trkSub'];

/** Index of each known field in a column-header line (-1 when absent), or the list of what is missing. */
export function adesColumnIndex(names: readonly string[]): Record<AdesField, number> | string {
  const lower = names.map((n) => n.trim().toLowerCase());
  const index = {} as Record<AdesField, number>;
  for (const f of ADES_FIELDS) index[f] = lower.indexOf(f.toLowerCase());
  const missing: string[] = ADES_REQUIRED.filter((f) => index[f] < 0);
  if (ADES_IDENTITY.every((f) => index[f] < 0)) missing.unshift('permID or provID or trkSub');
  return missing.length > 0 ? missing.join(', ') : index;
}
