// A small invented plant for the scenario tests, in the case format.
import { caseOpening } from '../../helpers/caseText.js';

// An invented two-header plant where one choice is open: HP steam reaches the
// LP header through a back-pressure turbine generator or through a plain
// throttling letdown. The LP header is held at 230 degC by its own spray of
// deaerator water, so both paths deliver the same LP steam; all condensate
// returns, nothing is vented or blown down, so no makeup is needed either way.
// The HP header is held at 420 degC (the boiler makes 425 degC steam, trimmed
// by spray) so the first pass starts from the right state: a floating HP
// header would start saturated, below the LP set point, and spray only cools.
export const SWITCH_CASE = `${caseOpening({ name: 'Switching-point plant', fuelPrice: 12 })}power:
  site_demand: 5 MW
  import: { price: 100 USD/MWh, max: 20 MW }
  export: { price: 0 USD/MWh, max: 0 MW }
headers:
  - { id: hp, pressure: 40 barg, state: controlled, temperature: 420 degC, venting: forbidden }
  - { id: lp, pressure: 10 barg, state: controlled, temperature: 230 degC, venting: forbidden }
boilers:
  - id: b1
    header: hp
    fuels: [gas]
    steam: { min: 0 t/h, max: 60 t/h }
    outlet_temperature: 425 degC
    efficiency: [{ load: 100 %, efficiency: 80 % }]
    blowdown: 0 %
    can_switch_off: false
turbines:
  - id: bptg
    inlet: hp
    stages:
      - { to: lp, isentropic_efficiency: 65 %, section_flow: { min: 0 t/h, max: 15 t/h } }
    mechanical_efficiency: 97 %
    generator_efficiency: 95 %
    can_switch_off: false
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 100 t/h, desuperheater: none }
users:
  - id: u1
    header: lp
    steam: 20 t/h
    condensate: { return: 100 %, temperature: 90 degC, to: deaerator }
deaerator:
  pressure: 0.2 barg
  heating_steam: lp
  vent: 0 %
objective: minimum_cost
sweeps:
  - id: import_price
    scenario: plant
    target: power.import.price
    from: 20 USD/MWh
    to: 200 USD/MWh
    steps: 19
  - id: near_switch
    scenario: plant
    target: power.import.price
    from: 57.9 USD/MWh
    to: 59.3 USD/MWh
    steps: 8
`;

/** The switching plant with a scenario that cannot be met: the LP user needs more than the boiler can raise. */
export const SWITCH_CASE_WITH_SHORTFALL = `${SWITCH_CASE}scenarios:
  - id: normal
    hours: 6000
    changes: {}
  - id: overload
    hours: 2000
    changes:
      users:
        - { id: u1, steam: 90 t/h }
`;
