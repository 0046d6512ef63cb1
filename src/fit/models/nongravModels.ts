/**
 * The catalogue of force models a body's orbit is fitted with, on top of the six orbital
 * elements: what each solves for, the radial law of its extra acceleration, the settings of the
 * core's force model (src/core/forces/forceModel.ts) it maps to, and the scale of each
 * parameter that a differential correction may use to bound its steps.
 *
 * Per-body parameter layout of the force model (PARAMS_PER_BODY = 4): [A1, A2, A3, A/m], A1–A3
 * in au/d² (the acceleration at 1 au when g(1 au) = 1), A/m in m²/kg.
 */
import type { ForceModelOptions } from '../../core/forces/forceModel.js';
import { PARAMS_PER_BODY } from '../../core/forces/forceModel.js';
import type { NonGravLaw } from '../../core/forces/nonGravLaw.js';

export type NongravModelId = 'gravity' | 'thermal' | 'comet' | 'srp';
export type NongravParamName = 'A1' | 'A2' | 'A3' | 'areaToMass';

/** One solved parameter of a model. */
export interface NongravParamSpec {
  name: NongravParamName;
  unit: 'au/d²' | 'm²/kg';
  /** Index in the force model's per-body parameter block [A1, A2, A3, A/m]. */
  forceIndex: 0 | 1 | 2 | 3;
  /**
   * Typical magnitude, in `unit`: the scale a differential correction compares a step with
   * (e.g. to limit a step to a few scales, or to regularize an ill-determined parameter).
   */
  priorScale: number;
  meaning: string;
}

export interface NongravModel {
  id: NongravModelId;
  /** Parameters solved besides the six elements, in the force model's order. */
  params: readonly NongravParamSpec[];
  /** Radial law of the extra acceleration ('none' for gravity only). */
  radialLaw: 'none' | 'inverse-square' | 'comet-water';
  /** Settings for the core's force model that give this model's extra acceleration. */
  forceOptions: Pick<ForceModelOptions, 'nonGravLaw' | 'radiationPressureCoefficient'>;
  /** One sentence: the model in plain words. */
  description: string;
}

/**
 * Radiation-pressure coefficient assumed by the 'srp' model: C_R = 1, a perfect absorber
 * (the core's default). Only the product C_R·A/m is observable; the fitted 'areaToMass' is that
 * product with C_R = 1, i.e. an effective area-to-mass ratio. Common practice.
 */
export const SRP_ASSUMED_CR = 1;

/** The inverse-square law of the thermal drift model ('inverse-square' in nonGravLaw.ts). */
const THERMAL_LAW: NonGravLaw = 'inverse-square';
/** The water-ice sublimation law of the comet model ('comet-water' in nonGravLaw.ts). */
const COMET_LAW: NonGravLaw = 'comet-water';

const A2_THERMAL: NongravParamSpec = {
  name: 'A2', unit: 'au/d²', forceIndex: 1,
  // Sub-kilometre near-Earth asteroids: A2 of 1e-15 to 1e-13 au/d² (Spoto et al. 2012, EPSC
  // Abstracts 7, EPSC2012-345, "typical values range from 10⁻¹³ to 10⁻¹⁵ AU/d²").
  priorScale: 1e-13,
  meaning: 'transverse acceleration at 1 au, falling as (1 au/r)²',
};

// Comet parameters: the order of magnitude of fitted A1 and A2 of short-period comets,
// 1e-8 and 1e-9 au/d² (Marsden, Sekanina & Yeomans 1973, AJ 78, 211, their tables; from memory).
const A1_COMET: NongravParamSpec = {
  name: 'A1', unit: 'au/d²', forceIndex: 0, priorScale: 1e-8,
  meaning: 'radial acceleration at 1 au, scaled by the water-ice law g(r)',
};
const A2_COMET: NongravParamSpec = {
  name: 'A2', unit: 'au/d²', forceIndex: 1, priorScale: 1e-9,
  meaning: 'transverse acceleration at 1 au, scaled by the water-ice law g(r)',
};
const A3_COMET: NongravParamSpec = {
  name: 'A3', unit: 'au/d²', forceIndex: 2, priorScale: 1e-9,
  meaning: 'normal acceleration at 1 au, scaled by the water-ice law g(r)',
};

const AREA_TO_MASS: NongravParamSpec = {
  name: 'areaToMass', unit: 'm²/kg', forceIndex: 3,
  // Between a metre-sized natural body (~3e-4 m²/kg) and a spent rocket stage (~1e-2 m²/kg)
  // (orders of magnitude from memory; see radiationPressurePlausibility.ts for the natural bound).
  priorScale: 1e-3,
  meaning: `effective area-to-mass ratio C_R·A/m with C_R = ${SRP_ASSUMED_CR} assumed (only the product is observable)`,
};

/** The four models, by id. The comet model solves A1 and A2; `withNormalComponent` adds A3. */
export const NONGRAV_MODELS: Readonly<Record<NongravModelId, NongravModel>> = {
  gravity: {
    id: 'gravity', params: [], radialLaw: 'none', forceOptions: {},
    description: 'gravity only: the fit\'s gravitational force model and no extra acceleration',
  },
  thermal: {
    id: 'thermal', params: [A2_THERMAL], radialLaw: 'inverse-square', forceOptions: { nonGravLaw: THERMAL_LAW },
    description: 'transverse thermal drift: A2·(1 au/r)² along the direction of motion (a Yarkovsky-type drift)',
  },
  comet: {
    id: 'comet', params: [A1_COMET, A2_COMET], radialLaw: 'comet-water', forceOptions: { nonGravLaw: COMET_LAW },
    description: 'comet outgassing: g(r)·(A1 radial + A2 transverse), g the water-ice sublimation law',
  },
  srp: {
    id: 'srp', params: [AREA_TO_MASS], radialLaw: 'inverse-square',
    forceOptions: { radiationPressureCoefficient: SRP_ASSUMED_CR },
    description: `radiation pressure: C_R·(S/c)·(A/m)·(1 au/r)² away from the Sun, C_R = ${SRP_ASSUMED_CR} assumed, A/m fitted`,
  },
};

export const NONGRAV_MODEL_IDS: readonly NongravModelId[] = ['gravity', 'thermal', 'comet', 'srp'];

/** The comet model with the normal component A3 solved as well (A1, A2, A3). */
export function withNormalComponent(model: NongravModel): NongravModel {
  if (model.id !== 'comet') throw new RangeError(`withNormalComponent: only the comet model has A3, got '${model.id}'`);
  if (model.params.some((p) => p.name === 'A3')) return model;
  return { ...model, params: [...model.params, A3_COMET], description: `${model.description}, plus A3 normal` };
}

/** A model by id; TypeError for an unknown id. */
export function nongravModel(id: string): NongravModel {
  if (!(NONGRAV_MODEL_IDS as readonly string[]).includes(id)) {
    throw new TypeError(`unknown non-gravitational model '${id}' (known: ${NONGRAV_MODEL_IDS.join(', ')})`);
  }
  return NONGRAV_MODELS[id as NongravModelId];
}

/**
 * The force model's per-body parameter block [A1, A2, A3, A/m] for solved values given in the
 * model's parameter order; parameters the model does not solve are 0.
 */
export function forceParamsFor(model: NongravModel, values: ArrayLike<number>): Float64Array {
  if (values.length !== model.params.length) {
    throw new RangeError(`model '${model.id}': ${values.length} values for ${model.params.length} parameters`);
  }
  const out = new Float64Array(PARAMS_PER_BODY);
  model.params.forEach((p, i) => {
    if (!Number.isFinite(values[i])) throw new RangeError(`model '${model.id}': ${p.name} is not finite: ${values[i]}`);
    out[p.forceIndex] = values[i];
  });
  return out;
}
