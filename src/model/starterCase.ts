// The commented starter case `steamwright init` writes: the smallest plant
// that passes `check`, with pointers to everything else the format offers.

/** `schemaReference`: path or URL of case.schema.json for the editor modeline. */
export function starterCase(schemaReference: string): string {
  return `# yaml-language-server: $schema=${schemaReference}
# A starter steamwright case. Edit the numbers, then run:  steamwright check THIS_FILE
# Every quantity is a string with its unit ("42 barg", "60 t/h", "9.5 EUR/GJ", "3 %").
# Ids are unique across the plant; items refer to each other by id.
# Also available: heat_recovery_boilers, steam_imports, turbines, flash_tanks,
# machines, solver; see the demo plants in the package's cases/ folder.

format_version: 1
name: My plant

site:
  ambient_temperature: 15 degC
  makeup_water: { temperature: 15 degC, cost: 1.5 EUR/t }   # water plus treatment
  currency: EUR
  units: si                          # si (barg, degC, t/h) or us (psig, degF, klb/h)

fuels:
  - id: gas
    price: 9 EUR/GJ
    basis: HHV                       # boiler efficiencies are on this basis too
    co2: 50.6 kg/GJ

power:
  site_demand: 2 MW
  import: { price: 100 EUR/MWh, max: 5 MW }

headers:
  - id: hp
    pressure: 10 barg
    state: controlled                # controlled (temperature or enthalpy) or floating
    temperature: 220 degC
  - id: lp
    pressure: 3 barg
    state: floating                  # set by mixing
    venting: allowed

boilers:
  - id: boiler_1
    header: hp
    fuels: [gas]
    steam: { min: 3 t/h, max: 15 t/h }
    outlet_temperature: 225 degC
    efficiency: 84 %                 # or a table: [{ load: 50 %, efficiency: 82 % }, ...]
    blowdown: 3 %                    # or { cycles_of_concentration: 30 }

letdowns:
  - id: prv_1
    from: hp
    to: lp
    capacity: 12 t/h
    desuperheater: none              # or { target_temperature: 160 degC, spray_water: feedwater }

users:
  - id: process
    header: lp
    steam: 6 t/h                     # or heat: 4 MW
    condensate: { return: 80 %, temperature: 95 degC, to: deaerator }

deaerator:
  pressure: 0.2 barg
  heating_steam: lp
  vent: 0.5 %

objective: minimum_cost
`;
}
