// Invented plants of 2 to 6 headers for the optimiser's property tests, drawn
// from a seed: floating and controlled headers, isentropic and Willans
// turbines (some switchable), letdowns with and without desuperheaters, boilers
// that may sit at their limits, flow and heat-duty users, and a vent on the
// lowest header.
import fc from 'fast-check';
import { caseOpening } from '../../helpers/caseText.js';
import { saturatedVapour, statePS } from '../../../src/properties/index.js';

export interface GeneratedPlant {
  headers: number;
  text: string;
  /** turbine ids, so a test can remove them one at a time */
  turbines: string[];
}

const PRESSURES = [60, 42, 18, 10, 4.5, 1.5];
/** set points of controlled headers, some 10 K above saturation at each pressure: turbine exhausts arrive hotter, and spray cools them */
const SET_POINTS = [420, 265, 222, 195, 165, 138];

export interface PlantShape {
  headers: number;
  topControlled: boolean;
  floating: boolean[];
  boilerMax: number;
  secondBoiler: boolean;
  turbines: { kind: 'isentropic' | 'willans'; from: number; span: number; efficiency: number; min: number; switchable: boolean }[];
  desuperheat: boolean[];
  users: { header: number; duty: boolean; size: number; returned: number }[];
  importPrice: number;
  exportPrice: number;
  siteDemand: number;
}

export const plantShape: fc.Arbitrary<PlantShape> = fc.integer({ min: 2, max: 6 }).chain((headers) =>
  fc.record({
    headers: fc.constant(headers),
    topControlled: fc.boolean(),
    floating: fc.array(fc.boolean(), { minLength: headers, maxLength: headers }),
    boilerMax: fc.integer({ min: 120, max: 220 }),
    secondBoiler: fc.boolean(),
    turbines: fc.array(
      fc.record({
        kind: fc.constantFrom('isentropic' as const, 'willans' as const),
        from: fc.integer({ min: 0, max: headers - 2 }),
        span: fc.integer({ min: 1, max: 2 }),
        efficiency: fc.integer({ min: 55, max: 80 }),
        min: fc.integer({ min: 0, max: 8 }),
        switchable: fc.boolean(),
      }),
      { minLength: 0, maxLength: 3 },
    ),
    desuperheat: fc.array(fc.boolean(), { minLength: headers, maxLength: headers }),
    users: fc.array(
      fc.record({ header: fc.integer({ min: 0, max: headers - 1 }), duty: fc.boolean(), size: fc.integer({ min: 2, max: 14 }), returned: fc.integer({ min: 0, max: 90 }) }),
      { minLength: 1, maxLength: 6 },
    ),
    importPrice: fc.integer({ min: 40, max: 160 }),
    exportPrice: fc.integer({ min: 0, max: 40 }),
    siteDemand: fc.integer({ min: 0, max: 6 }),
  }),
);

/** The case text of a shape; `without` drops the turbine with that index. */
export function plantText(shape: PlantShape, without: number | null = null): GeneratedPlant {
  const ids = (k: number): string => `h${k}`;
  const headerLines: string[] = [];
  for (let k = 0; k < shape.headers; k += 1) {
    const pressure = PRESSURES[k];
    const controlled = k === 0 ? shape.topControlled : !shape.floating[k] && k < shape.headers - 1;
    const temperature = SET_POINTS[k];
    const state = controlled ? `state: controlled, temperature: ${temperature} degC` : 'state: floating';
    const venting = k === shape.headers - 1 ? 'allowed' : 'forbidden';
    headerLines.push(`  - { id: ${ids(k)}, pressure: ${pressure} barg, ${state}, venting: ${venting}, heat_loss: ${20 + 10 * k} kW }`);
  }
  const boilers = [`  - id: b1
    header: h0
    fuels: [gas]
    steam: { min: 10 t/h, max: ${shape.boilerMax} t/h }
    outlet_temperature: 450 degC
    efficiency: [{ load: 30 %, efficiency: 80 % }, { load: 100 %, efficiency: 86 % }]
    blowdown: 2 %
    can_switch_off: false`];
  if (shape.secondBoiler) {
    boilers.push(`  - id: b2
    header: h0
    fuels: [gas]
    steam: { min: 8 t/h, max: 40 t/h }
    outlet_temperature: 430 degC
    efficiency: [{ load: 100 %, efficiency: 82 % }]
    blowdown: 3 %
    can_switch_off: true`);
  }
  const turbines: string[] = [];
  const turbineIds: string[] = [];
  shape.turbines.forEach((turbine, index) => {
    if (index === without) return;
    const to = Math.min(shape.headers - 1, turbine.from + turbine.span);
    const id = `t${index + 1}`;
    turbineIds.push(id);
    const performance =
      turbine.kind === 'isentropic'
        ? `isentropic_efficiency: ${turbine.efficiency} %`
        : `willans_line: { intercept: ${20 + turbine.min * 5} kW, slope: ${Math.min(Math.round(40 + 2 * turbine.efficiency * (to - turbine.from)), willansSlope(turbine.efficiency, PRESSURES[turbine.from], PRESSURES[to]))} kJ/kg }`;
    turbines.push(`  - id: ${id}
    inlet: h${turbine.from}
    stages:
      - to: h${to}
        ${performance}
        section_flow: { min: ${turbine.min} t/h, max: 40 t/h }
    generator_efficiency: 96 %
    can_switch_off: ${turbine.switchable}`);
  });
  const letdowns: string[] = [];
  for (let k = 0; k + 1 < shape.headers; k += 1) {
    const desuperheater = shape.desuperheat[k] ? `\n    desuperheater: { target_temperature: ${SET_POINTS[k + 1] + 15} degC, spray_water: feedwater }` : '';
    letdowns.push(`  - id: prv${k}
    from: h${k}
    to: h${k + 1}
    capacity: 120 t/h${desuperheater}`);
  }
  // Every header has a small user of its own: a header with a heat loss must carry steam.
  const baseLoads = Array.from({ length: shape.headers }, (_, k) => `  - id: base${k}
    header: h${k}
    steam: 1 t/h
    condensate: { return: 50 %, temperature: 95 degC, to: deaerator }`);
  const users = shape.users.map((user, index) => {
    const demand = user.duty ? `heat: ${(user.size * 0.6).toFixed(1)} MW` : `steam: ${user.size} t/h`;
    const condensate = user.returned > 0 ? `{ return: ${user.returned} %, temperature: 90 degC, to: deaerator }` : '{ return: 0 % }';
    return `  - id: u${index + 1}
    header: h${user.header}
    ${demand}
    condensate: ${condensate}`;
  });
  const text = `${caseOpening({ name: 'Generated plant' })}power:
  site_demand: ${shape.siteDemand} MW
  import: { price: ${shape.importPrice} USD/MWh, max: 40 MW }
  export: { price: ${shape.exportPrice} USD/MWh, max: 20 MW }
headers:
${headerLines.join('\n')}
boilers:
${boilers.join('\n')}
${turbines.length > 0 ? `turbines:\n${turbines.join('\n')}\n` : ''}letdowns:
${letdowns.join('\n')}
users:
${[...baseLoads, ...users].join('\n')}
deaerator:
  pressure: 0.3 barg
  heating_steam: h${shape.headers - 1}
  vent: 0.5 %
objective: minimum_cost
`;
  return { headers: shape.headers, text, turbines: turbineIds };
}

/**
 * The largest Willans slope the second law allows here: the stated share of the isentropic
 * drop from dry saturated steam at the inlet pressure (the coldest a floating
 * header holds dry) to the outlet, through 98 % x 96 % mechanical and
 * generator efficiency. Pressures in barg on 101.325 kPa.
 */
function willansSlope(efficiencyPercent: number, fromBarg: number, toBarg: number): number {
  const inlet = saturatedVapour(0.101325 + fromBarg / 10);
  const drop = inlet.h - statePS(0.101325 + toBarg / 10, inlet.s).h;
  return Math.floor((efficiencyPercent / 100) * drop * 0.98 * 0.96);
}
