/**
 * Ambient declarations for the parts of the untyped `astronomia` package (4.2.0) that the
 * core imports: the VSOP87 "B" series data, the ELP/MPP02 lunar series data, and (tests
 * only) the package's own VSOP87 evaluator used as an independent cross-check.
 */

/** One VSOP87 term: amplitude A, phase B (rad), frequency C (rad per Julian millennium). */
type AstronomiaVsop87Term = [number, number, number];

/** Series of one variable keyed by power of time ("0".."5"). */
type AstronomiaVsop87Variable = Record<string, AstronomiaVsop87Term[]>;

interface AstronomiaVsop87Data {
  L: AstronomiaVsop87Variable;
  B: AstronomiaVsop87Variable;
  R: AstronomiaVsop87Variable;
  name: string;
  type: string;
}

/**
 * ELP/MPP02 series: rows [A, φ0, φ1, φ2, φ3, φ4] for A·sin(φ0 + φ1 T + … + φ4 T⁴), T in
 * Julian centuries from J2000; L and B amplitudes in arcsec, R in km; W1 (rad) is the mean
 * lunar longitude polynomial.
 */
interface AstronomiaElpData {
  name: string;
  W1: number[];
  L: Record<string, number[][]>;
  B: Record<string, number[][]>;
  R: Record<string, number[][]>;
}

declare module 'astronomia/data/vsop87Bmercury' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/vsop87Bvenus' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/vsop87Bearth' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/vsop87Bmars' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/vsop87Bjupiter' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/vsop87Bsaturn' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/vsop87Buranus' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/vsop87Bneptune' { const d: AstronomiaVsop87Data; export default d; }
declare module 'astronomia/data/elpMppDe' { const d: AstronomiaElpData; export default d; }
/** The complete ELP/MPP02 (DE405) series; tests only, to measure the truncation above. */
declare module 'astronomia/data/elpMppDeFull' { const d: AstronomiaElpData; export default d; }

declare module 'astronomia/planetposition' {
  export class Planet {
    constructor(data: AstronomiaVsop87Data);
    /** Heliocentric lon (rad), lat (rad), range (au), dynamical ecliptic and equinox J2000. */
    position2000(jde: number): { lon: number; lat: number; range: number };
  }
  const planetposition: { Planet: typeof Planet };
  export default planetposition;
}

declare module 'astronomia/elp' {
  export class Moon {
    constructor(data: AstronomiaElpData);
    /** Geocentric rectangular km, inertial mean ecliptic and equinox of J2000. */
    positionXYZ(jde: number): { x: number; y: number; z: number };
  }
  const elp: { Moon: typeof Moon };
  export default elp;
}
