/**
 * Colour palette of every shalepoint figure: the eight colours of the Okabe–Ito
 * colour-universal-design set, chosen to stay distinguishable for readers with the common
 * forms of colour-vision deficiency.
 *
 * Reference: Okabe, M. and Ito, K. (2008), "Color Universal Design (CUD): How to make
 * figures and presentations that are friendly to colorblind people", J*FLY Data Depository
 * for Drosophila Researchers (web publication), Fig. 16 (the eight-colour set and its RGB
 * values).
 */

/** Okabe–Ito black, #000000 (RGB 0, 0, 0). */
export const OKABE_ITO_BLACK = "#000000";
/** Okabe–Ito orange, #E69F00 (RGB 230, 159, 0). */
export const OKABE_ITO_ORANGE = "#E69F00";
/** Okabe–Ito sky blue, #56B4E9 (RGB 86, 180, 233). */
export const OKABE_ITO_SKY_BLUE = "#56B4E9";
/** Okabe–Ito bluish green, #009E73 (RGB 0, 158, 115). */
export const OKABE_ITO_BLUISH_GREEN = "#009E73";
/** Okabe–Ito yellow, #F0E442 (RGB 240, 228, 66). Weak on white: use for fills, not thin lines. */
export const OKABE_ITO_YELLOW = "#F0E442";
/** Okabe–Ito blue, #0072B2 (RGB 0, 114, 178). */
export const OKABE_ITO_BLUE = "#0072B2";
/** Okabe–Ito vermillion, #D55E00 (RGB 213, 94, 0). */
export const OKABE_ITO_VERMILLION = "#D55E00";
/** Okabe–Ito reddish purple, #CC79A7 (RGB 204, 121, 167). */
export const OKABE_ITO_REDDISH_PURPLE = "#CC79A7";

/**
 * The Okabe–Ito palette by name (Okabe & Ito 2008, Fig. 16), as `#RRGGBB` strings.
 * @example OKABE_ITO.vermillion // "#D55E00"
 */
export const OKABE_ITO = {
  black: OKABE_ITO_BLACK,
  orange: OKABE_ITO_ORANGE,
  skyBlue: OKABE_ITO_SKY_BLUE,
  bluishGreen: OKABE_ITO_BLUISH_GREEN,
  yellow: OKABE_ITO_YELLOW,
  blue: OKABE_ITO_BLUE,
  vermillion: OKABE_ITO_VERMILLION,
  reddishPurple: OKABE_ITO_REDDISH_PURPLE,
} as const;

/** A colour name of the Okabe–Ito palette. */
export type OkabeItoName = keyof typeof OKABE_ITO;

/**
 * Order in which figure series take colours when none is given: the strong colours first,
 * yellow last (it is faint as a thin line on white).
 */
export const SERIES_COLOUR_ORDER: readonly string[] = Object.freeze([
  OKABE_ITO_BLUE,
  OKABE_ITO_VERMILLION,
  OKABE_ITO_BLUISH_GREEN,
  OKABE_ITO_REDDISH_PURPLE,
  OKABE_ITO_ORANGE,
  OKABE_ITO_SKY_BLUE,
  OKABE_ITO_BLACK,
  OKABE_ITO_YELLOW,
]);

/**
 * Colour of the `index`-th series (0-based), cycling through {@link SERIES_COLOUR_ORDER}.
 * @param index series number, integer ≥ 0 (negative or fractional values are floored and wrapped)
 * @returns a `#RRGGBB` Okabe–Ito colour
 * @example seriesColour(1) // "#D55E00" (vermillion)
 */
export function seriesColour(index: number): string {
  const n = SERIES_COLOUR_ORDER.length;
  const i = Number.isFinite(index) ? Math.floor(index) : 0;
  return SERIES_COLOUR_ORDER[((i % n) + n) % n];
}
