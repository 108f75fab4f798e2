// How close the solve must come to the audit's own figures.

/** Mass and energy balances and exact relations: relative residual. */
export const BALANCE_TOLERANCE = 1e-6;

/**
 * Boiler fuel against the efficiency curve. The linear model follows the
 * curve with straight pieces chosen so that fuel stays within 0.1 % of it
 * (see pieces.ts); between breakpoints it may differ by up to that much.
 */
export const FUEL_CURVE_TOLERANCE = 1e-3;

/**
 * Entropy generation may fall below zero by this share of the largest entropy
 * flow through the unit. A user that condenses steam exactly to saturated
 * liquid, its heat taken at saturation, generates none in theory; IF97's
 * regions 1, 2 and 4 agree at saturation only to a few parts in a million, and
 * such a user was measured at -3e-6 of its entropy flow.
 */
export const ENTROPY_TOLERANCE = 1e-5;

/**
 * A unit's relative tests (mass, energy, entropy) are scaled to at least this
 * share of the plant's largest stream figure (mass flow, energy flow, entropy
 * flow). A unit that is off carries only the solver's round-off: flows near
 * 1e-13 kg/s, even slightly below zero, were seen after warm starts, with
 * "residuals" of 1e-14 kg/s and "entropy generation" of -1e-14 kW/K that say
 * nothing about the plant. For the board mill (largest flow about 60 kg/s)
 * the mass test then ignores residuals below about 6e-11 kg/s.
 */
export const AUDIT_FLOOR_SHARE = 1e-6;

/** Terminals: where streams come from or go to outside the plant. */
export const OUTSIDE = 'outside';
export const ATMOSPHERE = 'atmosphere';
export const DRAIN = 'drain';
export const MAKEUP = 'makeup';
/** The feedwater pumps as one control volume between the deaerator and the boilers. */
export const FEED_PUMPS = 'feedwater pumps';
/** The site's electricity as one balance. */
export const SITE_POWER = 'site power';
