/**
 * Chart colours. One categorical palette for every chart: the eight colours of Okabe & Ito,
 * "Color Universal Design (CUD): how to make figures and presentations that are friendly to
 * colorblind people" (2008), chosen to stay distinct under the common forms of colour-vision
 * deficiency (protanopia, deuteranopia, tritanopia); the same eight are given by B. Wong,
 * "Points of view: Color blindness", Nature Methods 8, 441 (2011). Hex values from memory.
 */
import type { CoorbitalState } from '../../core/coorbital/types.js';

export const OKABE_ITO = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
} as const;

/**
 * One fixed colour per co-orbital state, the same in every chart. 'passing' (no libration)
 * is black, which the translucent state bands show as grey.
 */
export const STATE_COLOURS: Readonly<Record<CoorbitalState, string>> = {
  'quasi-satellite': OKABE_ITO.bluishGreen,
  'tadpole-L4': OKABE_ITO.orange,
  'tadpole-L5': OKABE_ITO.skyBlue,
  horseshoe: OKABE_ITO.reddishPurple,
  compound: OKABE_ITO.vermillion,
  passing: OKABE_ITO.black,
};

/**
 * Colours for categories in a scatter, in order (black is kept for outlines and marks of
 * note). Up to seven categories get these; more fall back to Vega's 'tableau20' scheme,
 * which is not designed for colour-vision deficiency.
 */
export const CATEGORY_COLOURS: readonly string[] = [
  OKABE_ITO.blue, OKABE_ITO.orange, OKABE_ITO.bluishGreen, OKABE_ITO.reddishPurple,
  OKABE_ITO.skyBlue, OKABE_ITO.vermillion, OKABE_ITO.yellow,
];

/**
 * Colours of up to twelve families on a proper-element map: the twelve of ColorBrewer's
 * qualitative scheme 'Paired' (Harrower & Brewer, "ColorBrewer.org: an online tool for
 * selecting colour schemes for maps", The Cartographic Journal 40, 27–37, 2003; hex values
 * from memory), its six dark members first so that the six largest families get the strongest
 * colours, then the six light ones. Not designed for colour-vision deficiency (no published
 * set of twelve is); the legend names every family.
 */
export const FAMILY_COLOURS: readonly string[] = [
  '#1f78b4', '#33a02c', '#e31a1c', '#ff7f00', '#6a3d9a', '#b15928',
  '#a6cee3', '#b2df8a', '#fb9a99', '#fdbf6f', '#cab2d6', '#ffff99',
];

/** Families beyond the coloured ones, one grey for all (our choice). */
export const OTHER_FAMILIES_COLOUR = '#8c8c8c';
/** Bodies outside every family, a light grey under everything else (our choice). */
export const BACKGROUND_BODIES_COLOUR = '#d4d4d4';

/** Opacity of background bands, so the data drawn over them stay readable (common practice). */
export const BAND_OPACITY = 0.25;
