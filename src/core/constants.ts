/**
 * Physical and astronomical constants, each with its published source.
 * Units are in the names. Values are exact where the source defines them so.
 */

/** Astronomical unit in metres. IAU 2012 Resolution B2 (exact, defining). */
export const M_PER_AU = 149_597_870_700;
/** Astronomical unit in kilometres. IAU 2012 Resolution B2. */
export const KM_PER_AU = M_PER_AU / 1000;
/** Seconds per day (SI day of 86 400 s). Common practice. */
export const SECONDS_PER_DAY = 86_400;
/** Days per Julian year. IAU definition of the Julian year. */
export const DAYS_PER_JULIAN_YEAR = 365.25;
/** Days per Julian century: 100 Julian years (IAU definition of the Julian year). */
export const DAYS_PER_JULIAN_CENTURY = 36_525;
/** Julian date of the J2000.0 epoch (2000 Jan 1.5 TT). IAU 1976/1994. */
export const J2000_JD = 2_451_545.0;
/** MJD = JD - 2 400 000.5. IAU 1997 Resolution B1. */
export const MJD_OFFSET = 2_400_000.5;

/** Speed of light, m/s. SI defining constant (exact). */
export const C_M_PER_S = 299_792_458;
/** Speed of light in au/day. Derived from C_M_PER_S and M_PER_AU. */
export const C_AU_PER_DAY = (C_M_PER_S * SECONDS_PER_DAY) / M_PER_AU;

/**
 * Nominal solar mass parameter GM_sun, m^3 s^-2.
 * IAU 2015 Resolution B3 (nominal conversion constant (GM)^N_sun = 1.3271244e20).
 */
export const GM_SUN_NOMINAL_M3_PER_S2 = 1.3271244e20;

/**
 * Heliocentric gravitational constant GM_sun in SI, m^3 s^-2, TDB-compatible,
 * as used by the DE430/DE431 planetary ephemerides (Folkner et al. 2014,
 * IPN Progress Report 42-196, Table 8: GM_sun = 132 712 440 041.939 400 km^3 s^-2).
 */
export const GM_SUN_DE430_KM3_PER_S2 = 132_712_440_041.9394;

/** Gaussian gravitational constant k, au^(3/2) day^-1 (IAU 1976 defining value). */
export const GAUSS_K = 0.01720209895;
/** GM_sun in au^3/day^2 (k^2). IAU 1976 system; the dynamics core uses this unit system. */
export const GM_SUN_AU3_PER_DAY2 = GAUSS_K * GAUSS_K;

/**
 * Planet identifiers used across the core. 'earth' is the geocentre; 'emb' the Earth–Moon
 * barycentre. Order matters: it indexes the arrays below.
 */
export type PlanetName =
  | 'mercury' | 'venus' | 'earth' | 'mars' | 'jupiter' | 'saturn' | 'uranus' | 'neptune';

export const PLANETS: readonly PlanetName[] = [
  'mercury', 'venus', 'earth', 'mars', 'jupiter', 'saturn', 'uranus', 'neptune',
];

/**
 * GM of each planet system in km^3/s^2 (planet with its moons; for 'earth' the Earth–Moon
 * system). Folkner et al. 2014, IPN Progress Report 42-196 (DE430/431), Table 8.
 * Values transcribed from memory of that table; the mass ratios below derive from them and
 * agree with the IAU 2009 best-estimate ratios (Luzum et al. 2011) to 1e-7, Mercury to 2e-5
 * (test/core/constants.test.ts).
 */
export const PLANET_GM_DE430_KM3_PER_S2: Readonly<Record<PlanetName, number>> = {
  mercury: 22_031.78,
  venus: 324_858.592,
  earth: 403_503.235502, // Earth + Moon
  mars: 42_828.375214,
  jupiter: 126_712_764.8,
  saturn: 37_940_585.2,
  uranus: 5_794_548.6,
  neptune: 6_836_527.10058,
};

/** Inverse mass ratio M_sun / M_planet-system, derived from the DE430 GM values above. */
export function sunMassRatio(planet: PlanetName): number {
  return GM_SUN_DE430_KM3_PER_S2 / PLANET_GM_DE430_KM3_PER_S2[planet];
}

/** GM of each planet system in au^3/day^2 (GM_SUN_AU3_PER_DAY2 / mass ratio). */
export function planetGmAu3PerDay2(planet: PlanetName): number {
  return GM_SUN_AU3_PER_DAY2 / sunMassRatio(planet);
}

/** Earth/Moon mass ratio, DE430 (Folkner et al. 2014, Table 8): 81.300 569 07. */
export const EARTH_MOON_MASS_RATIO = 81.30056907;

/**
 * Mean semimajor axes (au) of the planets at J2000, for screens only (not for dynamics).
 * Standish & Williams, "Keplerian Elements for Approximate Positions of the Major Planets"
 * (JPL, Table 1, 1800–2050 AD). Earth row is the Earth–Moon barycentre.
 */
export const PLANET_MEAN_A_AU: Readonly<Record<PlanetName, number>> = {
  mercury: 0.38709927,
  venus: 0.72333566,
  earth: 1.00000261,
  mars: 1.52371034,
  jupiter: 5.20288700,
  saturn: 9.53667594,
  uranus: 19.18916464,
  neptune: 30.06992276,
};

/** Mean eccentricities at J2000, same source and table as PLANET_MEAN_A_AU. */
export const PLANET_MEAN_E: Readonly<Record<PlanetName, number>> = {
  mercury: 0.20563593,
  venus: 0.00677672,
  earth: 0.01671123,
  mars: 0.09339410,
  jupiter: 0.04838624,
  saturn: 0.05386179,
  uranus: 0.04725744,
  neptune: 0.00859048,
};

/** Mean inclinations to the J2000 ecliptic (deg), same source and table. */
export const PLANET_MEAN_I_DEG: Readonly<Record<PlanetName, number>> = {
  mercury: 7.00497902,
  venus: 3.39467605,
  earth: -0.00001531,
  mars: 1.84969142,
  jupiter: 1.30439695,
  saturn: 2.48599187,
  uranus: 0.77263783,
  neptune: 1.77004347,
};

/** Obliquity of the ecliptic at J2000, IAU 2006 precession (Capitaine et al. 2003): 84 381.406″. */
export const OBLIQUITY_J2000_ARCSEC = 84_381.406;
export const OBLIQUITY_J2000_RAD = (OBLIQUITY_J2000_ARCSEC / 3600) * (Math.PI / 180);

/** Nominal total solar irradiance at 1 au, W m^-2. IAU 2015 Resolution B3. */
export const SOLAR_IRRADIANCE_1AU_W_PER_M2 = 1361;

export const DEG_PER_RAD = 180 / Math.PI;
export const RAD_PER_DEG = Math.PI / 180;
export const ARCSEC_PER_RAD = DEG_PER_RAD * 3600;
export const RAD_PER_ARCSEC = RAD_PER_DEG / 3600;
