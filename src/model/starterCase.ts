// The commented starter case `steamwright init` writes: a small plant that
// passes `check` and solves, with one of each thing a newcomer looks for
// (a turbine, a scenario, a project) and pointers to the rest of the format.

export type StarterUnits = 'si' | 'us';

/**
 * `schemaReference`: path or URL of case.schema.json for the editor modeline.
 * `units`: the unit system of every figure written (si: barg, degC, t/h, EUR;
 * us: psig, degF, klb/h, USD). The figures are an invented plant, the same in
 * both systems to the rounding of the US figures.
 */
export function starterCase(schemaReference: string, units: StarterUnits = 'si'): string {
  const us = units === 'us';
  const q = (si: string, inUs: string): string => (us ? inUs : si);
  return `# yaml-language-server: $schema=${schemaReference}
# A starter steamwright case (an invented plant). Edit the numbers, then run:
#   npx steamwright check THIS_FILE
#   npx steamwright solve THIS_FILE
#   npx steamwright compare THIS_FILE      (the plant as written and each scenario)
#   npx steamwright evaluate THIS_FILE     (each project over the scenarios)
# Every quantity is a string with its unit (${q('"42 barg", "60 t/h", "9.5 EUR/GJ"', '"600 psig", "130 klb/h", "4.8 $/MMBtu"')}, "3 %").
# Ids are unique across the plant; items refer to each other by id.
# Also available: heat_recovery_boilers, steam_imports, flash_tanks, machines,
# feedwater_pumps, sweeps, solver; see the demo plants in the package's cases/ folder.

format_version: 1
name: My plant

site:
  ambient_temperature: ${q('15 degC', '59 degF')}
  makeup_water: { temperature: ${q('15 degC', '59 degF')}, cost: ${q('1.5 EUR/t', '0.7 $/klb')} }   # water plus treatment
  currency: ${q('EUR', 'USD')}
  units: ${units}                          # si (barg, degC, t/h) or us (psig, degF, klb/h)

fuels:
  - id: gas
    price: ${q('9 EUR/GJ', '9.5 $/MMBtu')}
    basis: HHV                       # boiler efficiencies are on this basis too
    co2: ${q('50.6 kg/GJ', '117 lb/MMBtu')}

power:
  site_demand: 2 MW
  import: { price: ${q('100 EUR/MWh', '110 $/MWh')}, max: 5 MW }

headers:
  - id: hp
    pressure: ${q('10 barg', '145 psig')}
    state: controlled                # controlled (temperature or enthalpy) or floating
    temperature: ${q('220 degC', '430 degF')}
  - id: lp
    pressure: ${q('3 barg', '45 psig')}
    state: floating                  # set by mixing
    venting: allowed

boilers:
  - id: boiler_1
    header: hp
    fuels: [gas]
    steam: { min: ${q('3 t/h', '6.6 klb/h')}, max: ${q('15 t/h', '33 klb/h')} }
    outlet_temperature: ${q('225 degC', '437 degF')}
    efficiency: 84 %                 # or a table: [{ load: 50 %, efficiency: 82 % }, ...]
    blowdown: 3 %                    # or { cycles_of_concentration: 30 }

# A back-pressure turbine generator beside the letdown: steam that would be
# throttled makes power on its way down.
turbines:
  - id: bpt_1
    inlet: hp
    stages:
      - to: lp
        isentropic_efficiency: 55 %  # or exhaust_temperature, or a willans_line
        section_flow: { min: ${q('2 t/h', '4.4 klb/h')}, max: ${q('8 t/h', '17.6 klb/h')} }
    generator_efficiency: 95 %
    power: { max: 400 kW }
    can_switch_off: true

letdowns:
  - id: prv_1
    from: hp
    to: lp
    capacity: ${q('12 t/h', '26 klb/h')}
    desuperheater: none              # or { target_temperature: ${q('160 degC', '320 degF')}, spray_water: feedwater }

users:
  - id: process
    header: lp
    steam: ${q('6 t/h', '13 klb/h')}                     # or heat: 4 MW
    condensate: { return: 60 %, temperature: ${q('95 degC', '200 degF')}, to: deaerator }
  - id: heating
    header: lp
    steam: ${q('2 t/h', '4.4 klb/h')}
    condensate: { return: 80 %, temperature: ${q('80 degC', '176 degF')}, to: deaerator }

deaerator:
  pressure: ${q('0.2 barg', '3 psig')}
  heating_steam: lp
  vent: 0.5 %

objective: minimum_cost              # or minimum_fuel, maximum_power, minimum_co2

# Scenarios: hours per year and the changes from the plant as written
# (items matched by id; only the keys written change).
scenarios:
  - id: winter
    hours: 4000
    changes:
      users:
        - { id: heating, steam: ${q('4 t/h', '8.8 klb/h')} }
  - id: summer
    hours: 4000
    changes:
      users:
        - { id: heating, steam: ${q('0.5 t/h', '1.1 klb/h')} }

# Projects: a change with its costs, evaluated on every scenario against the
# scenario without it (capital and fixed_om in the site currency).
projects:
  - id: more_condensate
    name: Return more of the process condensate
    capital_cost: ${q('60000 EUR', '65000 USD')}
    life: 15 years
    discount_rate: 8 %
    fixed_om: ${q('2000 EUR/yr', '2200 USD/yr')}
    changes:
      users:
        - id: process
          condensate: { return: 85 %, temperature: ${q('95 degC', '200 degF')}, to: deaerator }
`;
}
