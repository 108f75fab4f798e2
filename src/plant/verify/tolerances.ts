// How close the solve must come to the audit's own figures.

/** Mass and energy balances and exact relations: relative residual. */
export const BALANCE_TOLERANCE = 1e-6;

/**
 * Boiler fuel against the efficiency curve. The linear model follows the
 * curve with straight pieces chosen so that fuel stays within 0.1 % of it
 * (see pieces.ts); between breakpoints it may differ by up to that much.
 */
export const FUEL_CURVE_TOLERANCE = 1e-3;

/** Entropy generation may fall below zero by this share of the entropy flowing through, for round-off. */
export const ENTROPY_TOLERANCE = 1e-9;

/** Terminals: where streams come from or go to outside the plant. */
export const OUTSIDE = 'outside';
export const ATMOSPHERE = 'atmosphere';
export const DRAIN = 'drain';
export const MAKEUP = 'makeup';
/** The feedwater pumps as one control volume between the deaerator and the boilers. */
export const FEED_PUMPS = 'feedwater pumps';
/** The site's electricity as one balance. */
export const SITE_POWER = 'site power';
