// A small invented plant whose LP header must vent, written in the case format.
import { caseOpening } from '../../helpers/caseText.js';

export interface VentingCase {
  /** least flow through the back-pressure turbine, e.g. "30 t/h" */
  turbineMin: string;
  /** the LP user's steam, e.g. "5 t/h" */
  lpUser: string;
  /** the waste-heat boiler's steam, set by its process, e.g. "4 t/h" */
  wasteHeat: string;
  /** hold LP at 170 degC with feedwater spray */
  lpControlled?: boolean;
  units?: 'si' | 'us';
}

// Two headers: HP from a gas boiler; LP fed by a back-pressure turbine that may not
// stop and must pass at least `turbineMin`, and by a waste-heat boiler whose steam is
// set by its process. LP may vent; its one user asks for `lpUser`.
export function ventingCase(options: VentingCase): string {
  const opening = caseOpening({ name: 'Venting plant' }).replace('units: si', `units: ${options.units ?? 'si'}`);
  return `${opening}power:
  site_demand: 0 kW
  import: { price: 100 USD/MWh, max: 10 MW }
  export: { price: 20 USD/MWh, max: 10 MW }
headers:
  - { id: hp, pressure: 40 barg, state: floating, venting: forbidden }
  - id: lp
    pressure: 4 barg
    state: ${options.lpControlled ? 'controlled\n    temperature: 170 degC' : 'floating'}
    venting: allowed
boilers:
  - id: b1
    header: hp
    fuels: [gas]
    steam: { min: 0 t/h, max: 100 t/h }
    outlet_temperature: 420 degC
    efficiency: [{ load: 100 %, efficiency: 85 % }]
    blowdown: 0 %
    can_switch_off: false
heat_recovery_boilers:
  - id: hrsg1
    header: lp
    steam: ${options.wasteHeat}
    outlet_temperature: saturated
    blowdown: 0 %
turbines:
  - id: bpt1
    inlet: hp
    stages:
      - { to: lp, isentropic_efficiency: 70 %, section_flow: { min: ${options.turbineMin}, max: 60 t/h } }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
    can_switch_off: false
    drives: generator
users:
  - { id: paper_machine, header: hp, steam: 20 t/h, condensate: { return: 0 % } }
  - { id: dryer, header: lp, steam: ${options.lpUser}, condensate: { return: 0 % } }
deaerator:
  pressure: 0.2 barg
  heating_steam: lp
  vent: 0 %
objective: minimum_cost
`;
}
