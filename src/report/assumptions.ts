// What the report rests on: the property standard, the method, and every
// default the case loader applied (plant.defaults).
import type { Plant } from '../model/index.js';

export interface Assumptions {
  general: string[];
  /** [where, value used, why] */
  defaults: string[][];
}

export function reportAssumptions(plant: Plant): Assumptions {
  return {
    general: [
      'Water and steam properties by IAPWS-IF97 (IAPWS R7-97(2012)), regions 1, 2 and 4 with the backward equations refined by Newton iteration.',
      'Operating point chosen by linear or mixed-integer optimisation (HiGHS) with every stream state fixed per pass, repeated until enthalpies change by less than the case tolerance.',
      'Marginal steam value: the shadow price of each header mass balance, the change in hourly cost when one more unit of steam is drawn there.',
      `Gauge pressures are measured from the site's atmospheric pressure, ${(plant.site.atmosphericPressure * 1000).toFixed(3)} kPa.`,
      `Fuel prices, CO2 factors and boiler efficiencies on the fuels' stated heating-value basis (${[...new Set(plant.fuels.map((fuel) => fuel.basis))].join(' and ') || 'none stated'}); steamwright does not convert between HHV and LHV.`,
      'Independent audit: every stream state and unit relation recomputed from the case with IAPWS-IF97; entropy generation per unit with header losses and condenser heat rejected at the site ambient temperature, process heat taken at the condensate temperature, and fuel or waste heat from a source at unknown (taken as very high) temperature.',
      `Figures in ${plant.site.unitSystem === 'si' ? 'SI units (barg, degC, t/h, kW)' : 'US units (psig, degF, klb/h, kW)'}; money in ${plant.site.currency}.`,
    ],
    defaults: plant.defaults.map((applied) => [applied.path, applied.value, applied.reason]),
  };
}
