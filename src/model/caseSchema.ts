// The JSON Schema (draft 2020-12) of a case file, written once here and
// shipped as schema/case.schema.json (tests/model/schemaFile.test.ts keeps the
// file identical). Quantities are strings checked loosely here; the loader
// parses them with src/units and reports the exact unit problem.
//
// Two annotation keywords help the error messages and are ignored by editors:
// "x-quantity" names the kind of quantity a string holds, "x-message" says in
// plain words what a oneOf / not constraint wants.

type Schema = Record<string, unknown>;

/** A number, then a unit: "42 barg", "1,200 kW", "-5 degC", "3 %". */
export const QUANTITY_PATTERN = '^\\s*[-+]?[0-9][0-9,_]*(\\.[0-9]*)?([eE][-+]?[0-9]+)?\\s*[^\\s0-9.,].*$|^\\s*[-+]?\\.[0-9]+\\s*[^\\s0-9].*$';
/** Ids: a letter, then letters, digits, underscores or hyphens. */
export const ID_PATTERN = '^[A-Za-z][A-Za-z0-9_-]*$';

export const SCHEMA_ID = 'https://steamwright.dev/schema/case.schema.json';

function quantity(kind: string, example: string, description: string): Schema {
  return { type: 'string', pattern: QUANTITY_PATTERN, 'x-quantity': kind, description, examples: [example] };
}

function quantityOr(word: string, kind: string, example: string, description: string): Schema {
  return {
    type: 'string',
    anyOf: [{ const: word }, { pattern: QUANTITY_PATTERN }],
    'x-quantity': kind,
    'x-message': `expected "${word}" or a ${kind} such as "${example}"`,
    description,
    examples: [example, word],
  };
}

function reference(description: string): Schema {
  return { type: 'string', pattern: ID_PATTERN, description };
}

function text(description: string): Schema {
  return { type: 'string', description };
}

function choice(values: string[], description: string): Schema {
  return { type: 'string', enum: values, description };
}

function object(description: string, properties: Record<string, Schema>, required: string[], extra: Schema = {}): Schema {
  return { type: 'object', description, properties, required, additionalProperties: false, ...extra };
}

function ref(name: string): Schema {
  return { $ref: `#/$defs/${name}` };
}

function list(name: string, description: string): Schema {
  return { type: 'array', description, items: ref(name) };
}

function exactlyOne(keys: string[], message: string): Schema {
  return { oneOf: keys.map((key) => ({ required: [key] })), 'x-message': message };
}

const id = { type: 'string', pattern: ID_PATTERN, description: 'unique id across the whole plant, used to refer to this unit' };
const name = text('display name');
const percent = (description: string, example = '85 %') => quantity('percent', example, description);
const flow = (description: string, example = '60 t/h') => quantity('massFlow', example, description);

const blowdown: Schema = {
  description: 'blowdown as a share of feedwater ("3 %") or from cycles of concentration',
  oneOf: [percent('blowdown as a share of feedwater', '3 %'), ref('cycles')],
  'x-message': 'expected a share of feedwater such as "3 %" or { cycles_of_concentration: 25 }',
};

const defs: Record<string, Schema> = {
  site: object('the site: atmosphere, makeup water, currency, display units', {
    atmospheric_pressure: quantity('pressure', '101.325 kPa', 'atmospheric pressure, the zero of gauge pressures; default 101.325 kPa'),
    ambient_temperature: quantity('temperature', '15 degC', 'ambient air temperature: where header losses and condenser heat go, for the audit\'s entropy generation'),
    makeup_water: ref('makeupWater'),
    currency: { type: 'string', pattern: '^[A-Z]{3}$', description: 'currency code every price is stated in, e.g. EUR, USD, GBP', examples: ['EUR'] },
    units: choice(['si', 'us'], 'unit system for display: si (barg, degC, t/h) or us (psig, degF, klb/h)'),
    carbon_price: quantity('massPrice', '80 EUR/t', 'price of emitted CO2 per tonne; default 0'),
  }, ['ambient_temperature', 'makeup_water', 'currency', 'units']),
  makeupWater: object('treated makeup water', {
    temperature: quantity('temperature', '15 degC', 'makeup water temperature'),
    cost: quantity('massPrice', '1.5 EUR/t', 'cost of water plus treatment per tonne'),
  }, ['temperature', 'cost']),
  fuel: object('a fuel', {
    id, name,
    price: quantity('energyPrice', '9.5 EUR/GJ', 'price per energy on the stated basis'),
    basis: choice(['HHV', 'LHV'], 'heating-value basis of price, CO2 factor and efficiencies of boilers burning it'),
    co2: quantity('emissionFactor', '56.1 kg/GJ', 'CO2 emitted per energy on the same basis'),
  }, ['id', 'price', 'basis', 'co2']),
  power: object('site electricity', {
    site_demand: quantity('power', '12 MW', 'site electric demand'),
    import: ref('powerImport'),
    export: ref('powerExport'),
  }, ['site_demand']),
  powerImport: object('electricity bought; leave out when none may be bought', {
    price: quantity('energyPrice', '95 EUR/MWh', 'price of imported electricity'),
    max: quantity('power', '20 MW', 'import limit'),
    minimum_billed: quantity('power', '2 MW', 'take-or-pay: import below this is billed anyway; default 0'),
    shortfall_price: quantity('energyPrice', '60 EUR/MWh', 'price of each MWh of shortfall below minimum_billed'),
    co2: quantity('emissionFactor', '0.35 kg/kWh', 'CO2 of grid electricity; default 0'),
  }, ['price', 'max']),
  powerExport: object('electricity sold; leave out when none may be sold', {
    price: quantity('energyPrice', '45 EUR/MWh', 'price of exported electricity'),
    max: quantity('power', '5 MW', 'export limit'),
  }, ['price', 'max']),
  header: object('a steam header', {
    id, name,
    pressure: quantity('pressure', '42 barg', 'header pressure'),
    state: choice(['controlled', 'floating'], 'controlled: held at a temperature or enthalpy; floating: set by mixing'),
    temperature: quantity('temperature', '400 degC', 'set temperature of a controlled header'),
    enthalpy: quantity('specificEnthalpy', '3200 kJ/kg', 'set enthalpy of a controlled header'),
    venting: choice(['allowed', 'forbidden'], 'whether steam may be vented from this header; default forbidden'),
    heat_loss: quantity('power', '150 kW', 'fixed heat loss of the header piping; default 0'),
  }, ['id', 'pressure', 'state'], {
    allOf: [
      {
        if: { properties: { state: { const: 'controlled' } }, required: ['state'] },
        then: exactlyOne(['temperature', 'enthalpy'], 'a controlled header needs a temperature or an enthalpy, one of the two'),
      },
      {
        if: { properties: { state: { const: 'floating' } }, required: ['state'] },
        then: {
          not: { anyOf: [{ required: ['temperature'] }, { required: ['enthalpy'] }] },
          'x-message': 'a floating header takes no temperature or enthalpy: its state is set by mixing',
        },
      },
    ],
  }),
  flowRange: object('a flow range; min defaults to 0', {
    min: flow('smallest flow', '10 t/h'),
    max: flow('largest flow'),
  }, ['max']),
  openRange: object('a range; either end may be left out', {
    min: quantity('any', '0 t/h', 'lower limit'),
    max: quantity('any', '60 t/h', 'upper limit'),
  }, []),
  efficiencyPoint: object('boiler efficiency at one load', {
    load: percent('load as a share of maximum steam', '50 %'),
    efficiency: percent('efficiency at that load'),
  }, ['load', 'efficiency']),
  cycles: object('blowdown from cycles of concentration (blowdown = feedwater / cycles)', {
    cycles_of_concentration: { type: 'number', exclusiveMinimum: 1, description: 'boiler water over feedwater concentration', examples: [25] },
  }, ['cycles_of_concentration']),
  boiler: object('a fired boiler', {
    id, name,
    header: reference('header it discharges into'),
    fuels: { type: 'array', minItems: 1, items: reference('fuel id'), description: 'fuels it may burn' },
    steam: ref('flowRange'),
    outlet_temperature: quantityOr('saturated', 'temperature', '410 degC', 'outlet steam temperature, or saturated'),
    efficiency: {
      description: 'one efficiency ("84 %") or a table against load',
      oneOf: [percent('efficiency at every load'), { type: 'array', minItems: 1, items: ref('efficiencyPoint') }],
      'x-message': 'expected an efficiency such as "84 %" or a list of { load, efficiency }',
    },
    blowdown,
    blowdown_to: reference('a flash tank id, or drain (default)'),
    can_switch_off: { type: 'boolean', description: 'whether it may be switched off; default true' },
    switching: ref('switching'),
  }, ['id', 'header', 'fuels', 'steam', 'outlet_temperature', 'efficiency', 'blowdown']),
  switching: object('what stopping and starting costs and how long a unit must stay running or stopped, for a year solved hour by hour (needs can_switch_off: true); a year with such units is solved as rolling windows, each one mixed-integer program', {
    start_cost: { type: 'string', description: 'cost of one start in the site currency; default none', examples: ['1800 EUR'] },
    min_hours_on: { oneOf: [{ type: 'number' }, { type: 'string' }], 'x-message': 'expected hours such as 6 or "6 h"', description: 'hours it must run once started: a number or "6 h"; default 0', examples: [6, '6 h'] },
    min_hours_off: { oneOf: [{ type: 'number' }, { type: 'string' }], 'x-message': 'expected hours such as 4 or "4 h"', description: 'hours it must stay stopped once stopped: a number or "4 h"; default 0', examples: [4, '4 h'] },
  }, []),
  supplementaryFiring: object('duct burner of a heat-recovery boiler', {
    fuel: reference('fuel id'),
    max_steam: flow('extra steam it can raise', '10 t/h'),
    efficiency: percent('fuel-to-steam efficiency of the extra firing', '90 %'),
  }, ['fuel', 'max_steam', 'efficiency']),
  heatRecoveryBoiler: object('a waste-heat boiler', {
    id, name,
    header: reference('header it discharges into'),
    steam: {
      description: 'a fixed flow ("18 t/h") or a range',
      oneOf: [flow('fixed steam flow', '18 t/h'), ref('flowRange')],
      'x-message': 'expected a flow such as "18 t/h" or { min, max }',
    },
    outlet_temperature: quantityOr('saturated', 'temperature', '380 degC', 'outlet steam temperature, or saturated'),
    blowdown,
    blowdown_to: reference('a flash tank id, or drain (default)'),
    supplementary_firing: ref('supplementaryFiring'),
  }, ['id', 'header', 'steam', 'outlet_temperature', 'blowdown']),
  steamImport: object('steam bought from outside the fence', {
    id, name,
    header: reference('header it is delivered to'),
    price: quantity('massPrice', '25 EUR/t', 'price per tonne'),
    min: flow('smallest flow; default 0', '0 t/h'),
    max: flow('largest flow', '15 t/h'),
    temperature: quantityOr('saturated', 'temperature', '250 degC', 'delivered temperature, or saturated'),
    enthalpy: quantity('specificEnthalpy', '2750 kJ/kg', 'delivered enthalpy, instead of a temperature; below the saturated vapour enthalpy the steam is wet'),
  }, ['id', 'header', 'price', 'max'], {
    allOf: [exactlyOne(['temperature', 'enthalpy'], 'a steam import needs a temperature or an enthalpy, one of the two')],
  }),
  willansLine: object('Willans line: power = slope x flow - intercept', {
    intercept: quantity('power', '250 kW', 'no-load loss'),
    slope: quantity('specificEnthalpy', '200 kJ/kg', 'power per unit of flow (kW per kg/s = kJ/kg)'),
  }, ['intercept', 'slope']),
  stage: object('one turbine stage: the section from the previous point to this exhaust or extraction', {
    id: { type: 'string', pattern: ID_PATTERN, description: 'stage id, unique within its turbine; with an id on every stage a scenario changes one stage alone' },
    to: reference('header the steam leaves to'),
    condenser_pressure: quantity('pressure', '0.1 bara', 'condenser pressure of a condensing stage'),
    condensate_to: reference('where a condensing stage\'s condensate goes: deaerator (the default), drain, or a flash tank id'),
    isentropic_efficiency: percent('isentropic efficiency of the section', '75 %'),
    exhaust_enthalpy: quantity('specificEnthalpy', '2950 kJ/kg', 'exhaust enthalpy'),
    exhaust_temperature: quantity('temperature', '260 degC', 'exhaust temperature'),
    willans_line: ref('willansLine'),
    outflow: ref('openRange'),
    section_flow: ref('openRange'),
  }, [], {
    allOf: [
      exactlyOne(['to', 'condenser_pressure'], 'a stage needs to (a header) or condenser_pressure, one of the two'),
      exactlyOne(['isentropic_efficiency', 'exhaust_enthalpy', 'exhaust_temperature', 'willans_line'],
        'a stage needs one of isentropic_efficiency, exhaust_enthalpy, exhaust_temperature, willans_line'),
    ],
  }),
  turbine: object('a steam turbine', {
    id, name,
    inlet: reference('inlet header'),
    stages: { type: 'array', minItems: 1, items: ref('stage'), description: 'stages in flow order' },
    mechanical_efficiency: percent('mechanical efficiency; default 98 %', '98 %'),
    generator_efficiency: percent('generator efficiency; default 97 %', '97 %'),
    power: ref('openRange'),
    can_switch_off: { type: 'boolean', description: 'whether it may be stopped; default true' },
    switching: ref('switching'),
    drives: reference('generator (default), or the id of a machine or feedwater pump'),
  }, ['id', 'inlet', 'stages']),
  desuperheater: object('desuperheater after a letdown valve', {
    target_temperature: quantity('temperature', '220 degC', 'outlet temperature'),
    spray_water: choice(['feedwater', 'makeup'], 'where the spray water comes from'),
  }, ['target_temperature', 'spray_water']),
  letdown: object('a pressure-reducing (letdown) station', {
    id, name,
    from: reference('higher-pressure header'),
    to: reference('lower-pressure header'),
    capacity: flow('largest flow', '40 t/h'),
    desuperheater: {
      description: 'none (throttling only, the default) or a desuperheater',
      oneOf: [{ const: 'none' }, ref('desuperheater')],
      'x-message': 'expected none or { target_temperature, spray_water }',
    },
  }, ['id', 'from', 'to', 'capacity']),
  condensate: object('condensate returned by a user', {
    return: percent('share of the steam returned as condensate', '80 %'),
    temperature: quantity('temperature', '90 degC', 'condensate temperature'),
    to: reference('a flash tank id, deaerator or drain'),
  }, ['return']),
  user: object('a process steam user', {
    id, name,
    header: reference('header it takes steam from'),
    steam: flow('steam demand', '12 t/h'),
    heat: quantity('power', '8 MW', 'heat duty, met by condensing steam'),
    condensate: ref('condensate'),
  }, ['id', 'header'], {
    ...exactlyOne(['steam', 'heat'], 'a user needs steam (a flow) or heat (a duty), one of the two'),
  }),
  flashTank: object('a flash tank', {
    id, name,
    pressure: quantity('pressure', '3.5 barg', 'tank pressure'),
    vapour_to: reference('header the flash steam goes to, or atmosphere'),
    liquid_to: reference('deaerator, drain, or another flash tank'),
    makeup_preheater: ref('makeupPreheater'),
  }, ['id', 'pressure', 'vapour_to', 'liquid_to']),
  makeupPreheater: object('a heat exchanger that warms the makeup water with the tank\'s liquid on its way to drain (blowdown heat recovery); only with liquid_to: drain', {
    leaving_temperature: quantity('temperature', '30 degC', 'temperature the liquid leaves the exchanger at, to drain: above the makeup water\'s, below the tank\'s saturation'),
  }, ['leaving_temperature']),
  feedwaterPump: object('a boiler feedwater pump', {
    id, name,
    efficiency: percent('hydraulic efficiency', '70 %'),
    motor_efficiency: percent('efficiency of its electric motor; leave out if only a turbine drives it', '95 %'),
    alternative_drive: ref('alternativeDrive'),
  }, ['id', 'efficiency']),
  deaerator: object('the deaerator', {
    pressure: quantity('pressure', '0.3 barg', 'deaerator pressure'),
    heating_steam: reference('header that supplies heating steam'),
    vent: percent('vent as a share of feedwater', '0.5 %'),
    feedwater_pumps: { description: 'boiler feedwater pumps, or none to leave pump work out; when left out, pump work is counted at 100 % efficiency and bought as electricity', oneOf: [list('feedwaterPump', 'boiler feedwater pumps'), { const: 'none' }] },
  }, ['pressure', 'heating_steam', 'vent']),
  meter: object('a flow meter on one stream, a thermometer on a header or a stream into one, a pressure gauge on a header, a power meter on a turbine or a fuel meter on a fired boiler, read by steamwright reconcile', {
    tag: { type: 'string', pattern: '^[A-Za-z0-9][A-Za-z0-9_./-]*$', description: 'the meter tag as the readings file names it, unique among meters', examples: ['FT-101'] },
    name: text('what the meter is called on site'),
    unit: reference('id of the unit, header, flash tank or the deaerator whose stream it measures'),
    measures: choice(['steam', 'feedwater', 'blowdown', 'condensate', 'letdown', 'spray', 'extraction', 'exhaust', 'vent', 'makeup', 'heating_steam', 'flash_vapour', 'flash_liquid', 'temperature', 'pressure', 'power', 'fuel'], 'which of its streams; temperature: a header\'s steam temperature (unit: the header), or that of a unit\'s stream into a header (to: the header); pressure: a header\'s pressure (unit: the header); power: a turbine\'s output (unit: the turbine), at its generator terminals or, for a turbine that drives a machine, at its shaft; fuel: a fired boiler\'s fuel as energy per hour on its fuel\'s heating-value basis (unit: the boiler)'),
    to: reference('the other end of the stream, where the unit has several of that kind (a turbine stage exhaust, a condensate return)'),
    uncertainty: { type: 'string', pattern: QUANTITY_PATTERN, description: 'expanded uncertainty of a reading: as % of reading or as a flow for a flow meter, as a temperature difference for a thermometer, as a pressure difference (bar, psi, kPa; not a gauge unit) for a pressure gauge, as % or a power (energy per hour) for a power or fuel meter', examples: ['2 %', '0.5 t/h', '1 K', '0.1 bar', '20 kW'] },
    confidence: { type: 'string', pattern: QUANTITY_PATTERN, 'x-quantity': 'percent', description: 'two-sided confidence of the stated uncertainty; default 95 %', examples: ['95 %'] },
  }, ['tag', 'unit', 'measures', 'uncertainty']),
  machine: object('a machine a turbine may drive (pump, fan, compressor)', {
    id, name,
    type: choice(['pump', 'fan', 'compressor'], 'kind of machine'),
    shaft_power: quantity('power', '400 kW', 'shaft power it needs while running'),
    motor_efficiency: percent('efficiency of its electric motor; leave out if only a turbine drives it', '95 %'),
    alternative_drive: ref('alternativeDrive'),
  }, ['id', 'type', 'shaft_power']),
  alternativeDrive: object('the other drive the machine could have in place of its own (so it has both: the installed one and this), for the savings drive measure', {
    motor_efficiency: percent('an electric motor in place of its turbine: the motor\'s efficiency', '95 %'),
    turbine_from: reference('a back-pressure steam turbine in place of its motor: the header it takes steam from'),
    turbine_to: reference('that turbine\'s exhaust header, at a lower pressure'),
    isentropic_efficiency: percent('that turbine\'s isentropic efficiency', '45 %'),
  }, [], exactlyOne(['motor_efficiency', 'turbine_from'], 'an alternative drive is a motor (motor_efficiency) or a turbine (turbine_from, turbine_to, isentropic_efficiency), one of the two')),
  absorptionChiller: object('a chilled-water plant: absorption chillers on steam up to their capacity, electric chillers for the rest of the cooling demand', {
    id, name,
    header: reference('header the absorption generator takes steam from'),
    cooling: quantity('power', '350 TR', 'cooling demand of the chilled-water plant (kW, MW or TR, tons of refrigeration)'),
    capacity: quantity('power', '400 TR', 'absorption cooling that can be made; 0 when there are only electric chillers'),
    effect: choice(['single', 'double'], 'single-effect (low-pressure steam) or double-effect (higher pressure, higher COP)'),
    cop: { type: 'number', exclusiveMinimum: 0, maximum: 3, description: 'cooling over the heat the steam gives up; default 0.7 single-effect, 1.2 double-effect', examples: [0.7] },
    electric_chillers: { type: 'string', description: 'electricity of the electric chillers the absorption cooling displaces, per ton or per kW of cooling: "0.65 kW/TR" or "0.18 kW/kW"', examples: ['0.65 kW/TR'] },
    condensate: ref('condensate'),
  }, ['id', 'header', 'cooling', 'capacity', 'effect', 'electric_chillers']),
  trapGroup: object('steam traps on one header, from a trap survey', {
    id, name,
    header: reference('header the traps drain'),
    installed: { type: 'integer', minimum: 0, description: 'traps installed' },
    failed_open: {
      description: 'traps found failed open (blowing steam): a count, or a share of those installed such as "15 %"',
      oneOf: [{ type: 'integer', minimum: 0 }, percent('share of the installed traps failed open', '15 %')],
      'x-message': 'expected a count such as 12 or a share such as "15 %"',
    },
    orifice: { type: 'string', description: 'orifice diameter of the traps: "1/8 in", "0.125 in" or "3.2 mm"', examples: ['1/8 in'] },
    discharge_coefficient: { type: 'number', exclusiveMinimum: 0, maximum: 1, description: 'discharge coefficient on Napier\'s orifice relation; default 0.73 (matches the DOE Steam Tip Sheet #1 table)' },
  }, ['id', 'header', 'installed', 'failed_open', 'orifice']),
  insulationRepair: object('bare pipe on one header found by an insulation survey', {
    header: reference('header whose piping is bare'),
    bare_length: { type: 'string', description: 'length of bare pipe: "80 m" or "260 ft"', examples: ['80 m'] },
    heat_loss_after: quantity('power', '10 kW', 'the header\'s whole heat loss once insulated; default 10 % of its heat_loss'),
  }, ['header', 'bare_length']),
  costs: object('unit costs for savings measures (screening estimates); each left out takes a default whose source check --verbose names', {
    back_pressure_turbine: { type: 'string', description: 'installed cost of a back-pressure turbine generator per kW', examples: ['600 USD/kW'] },
    absorption_chilling: { type: 'string', description: 'installed cost of absorption chilling per ton of refrigeration or per kW of cooling', examples: ['1500 USD/TR'] },
    trap_repair: { type: 'string', description: 'cost of repairing or replacing one failed trap', examples: ['350 USD/trap'] },
    condensate_return: { type: 'string', description: 'installed cost of condensate return per t/h (or klb/h) returned', examples: ['20000 USD/(t/h)'] },
    insulation: { type: 'string', description: 'cost of insulation repaired per m (or ft)', examples: ['120 USD/m'] },
    flash_tank: { type: 'string', description: 'installed cost of one flash tank with its piping and trap', examples: ['30000 USD'] },
    makeup_preheater: { type: 'string', description: 'installed cost of one heat exchanger warming makeup water with blowdown', examples: ['25000 USD'] },
    turbine_drive: { type: 'string', description: 'installed cost of a steam turbine drive for a machine, per kW (or hp) of shaft power', examples: ['400 USD/kW'] },
    motor_drive: { type: 'string', description: 'installed cost of an electric motor drive for a machine, per kW (or hp) of shaft power', examples: ['150 USD/kW'] },
    life: { type: ['number', 'string'], description: 'economic life of measures, years; default 15', examples: [15, '15 years'] },
    discount_rate: percent('discount rate per year; default 10 %', '10 %'),
  }, []),
  changedItem: {
    type: 'object',
    description: 'changes to one listed item, matched by id; any of its keys, checked after merging (null removes an optional key)',
    properties: { id: reference('id of the item to change') },
    required: ['id'],
  },
  changes: object('an overlay merged onto its base: maps merge key by key, listed items by id, other values are replaced', {
    ...Object.fromEntries(['fuels', 'headers', 'boilers', 'heat_recovery_boilers', 'steam_imports', 'turbines', 'letdowns', 'users', 'flash_tanks', 'machines', 'absorption_chillers', 'steam_traps']
      .map((key) => [key, { type: 'array', items: ref('changedItem'), description: `changes to ${key.replace(/_/g, ' ')}, matched by id` }])),
    site: { type: 'object', description: 'changes to the site (merged key by key)' },
    power: { type: 'object', description: 'changes to power import, export and site demand (merged key by key)' },
    deaerator: { type: 'object', description: 'changes to the deaerator (merged key by key)' },
    solver: { type: 'object', description: 'changes to the solver options' },
    objective: choice(['minimum_cost', 'minimum_fuel', 'maximum_power', 'minimum_co2'], 'a different objective'),
    disable: { type: 'array', items: reference('id of a unit taken out of service'), description: 'units taken out of service (removed), by id' },
    add: ref('add'),
  }, []),
  add: object('new items appended to their lists', {
    fuels: list('fuel', 'new fuels'),
    headers: list('header', 'new headers'),
    boilers: list('boiler', 'new fired boilers'),
    heat_recovery_boilers: list('heatRecoveryBoiler', 'new waste-heat boilers'),
    steam_imports: list('steamImport', 'new steam purchases'),
    turbines: list('turbine', 'new turbines'),
    letdowns: list('letdown', 'new letdown stations'),
    users: list('user', 'new users'),
    flash_tanks: list('flashTank', 'new flash tanks'),
    machines: list('machine', 'new machines'),
    absorption_chillers: list('absorptionChiller', 'new chilled-water plants'),
    steam_traps: list('trapGroup', 'new trap survey groups'),
  }, []),
  scenario: object('a season or production case: an overlay on the plant or on another scenario', {
    id: reference('scenario id, unique among scenarios'),
    name,
    hours: { type: ['number', 'string'], exclusiveMinimum: 0, maximum: 8784, description: 'operating hours per year in this scenario: a number of hours or a quantity such as "3000 h"', examples: [3000, '3000 h'] },
    base: reference('plant (the default: the case as written) or the id of another scenario'),
    changes: ref('changes'),
  }, ['id', 'hours']),
  project: object('a project: an overlay with its costs, evaluated on every scenario', {
    id: reference('project id, unique among projects'),
    name,
    capital_cost: { type: 'string', description: 'capital cost in the site currency', examples: ['1.2e6 EUR'] },
    life: { type: ['number', 'string'], description: 'economic life in years', examples: [15, '15 years'] },
    discount_rate: percent('discount rate per year', '8 %'),
    fixed_om: { type: 'string', description: 'fixed operating and maintenance cost per year; default 0', examples: ['20000 EUR/yr'] },
    changes: ref('changes'),
  }, ['id', 'capital_cost', 'life', 'discount_rate', 'changes']),
  sweep: object('one value varied over a range, to show where the operation switches', {
    id: reference('sweep id'),
    name,
    scenario: reference('the scenario varied; default plant (the case as written)'),
    target: { type: 'string', pattern: '^[A-Za-z_][A-Za-z0-9_-]*(\\.[A-Za-z_][A-Za-z0-9_-]*)+$', description: 'dotted path of the value, list items by id', examples: ['power.import.price', 'users.building_heating.steam'] },
    from: { type: 'string', description: 'first value, with its unit', examples: ['40 EUR/MWh'] },
    to: { type: 'string', description: 'last value, in the same unit', examples: ['120 EUR/MWh'] },
    steps: { type: 'integer', minimum: 2, maximum: 1000, description: 'number of values, ends included' },
  }, ['id', 'target', 'from', 'to', 'steps']),
  profile: object('the year as periods: a CSV file, one row per period, read by `steamwright year`', {
    file: {
      type: 'string',
      minLength: 1,
      description: [
        'CSV file relative to the case. The first row names the columns. Periods are either',
        'hourly, with a "timestamp" column (YYYY-MM-DDTHH:MM, one row per consecutive hour, no gaps or repeats),',
        'or a "period" column (a label) with an "hours" column (hours the period stands for) and an optional "month" column (1 to 12).',
        'Every other column sets one case value in every period, named "<id>.<field> [unit]", cells plain numbers in that unit:',
        '<user>.steam [t/h], <user>.heat [MW], <heat recovery boiler>.steam [t/h], <fuel>.price [EUR/GJ],',
        'power.import.price [EUR/MWh], power.export.price [EUR/MWh], power.site_demand [MW],',
        'site.makeup_water.temperature [degC], site.ambient_temperature [degC], and',
        '<boiler, heat recovery boiler, steam import, turbine or letdown>.available (no unit: 1 in service, 0 out).',
        'Any unit of the right kind may be used; prices must be in the site currency.',
      ].join(' '),
      examples: ['profiles/kestrel-bay-year.csv'],
    },
    hours: { type: 'integer', minimum: 1, maximum: 8784, description: 'hours the profile must cover in total (8760 for a year of hourly rows); checked when given' },
  }, ['file']),
  solver: object('solver options', {
    mip_gap: percent('relative MIP gap; default 0.01 %', '0.01 %'),
    time_limit_seconds: { type: 'number', exclusiveMinimum: 0, description: 'time limit per solve; default 60' },
    max_passes: { type: 'integer', minimum: 1, description: 'most successive-linearisation passes; default 30' },
    enthalpy_tolerance: quantity('specificEnthalpy', '0.1 kJ/kg', 'convergence tolerance on enthalpy; default 0.1 kJ/kg'),
  }, []),
};

export const caseSchema: Schema = {
  $schema: 'https://json-schema.org/draft/2020-12/schema',
  $id: SCHEMA_ID,
  title: 'steamwright plant case',
  description: 'A steam plant described once: site, fuels, power, headers and equipment. Every quantity is a string with its unit.',
  ...object('a steam plant case', {
    format_version: { const: 1, description: 'version of this case format' },
    name: text('plant name'),
    description: text('free text'),
    site: ref('site'),
    fuels: list('fuel', 'fuels'),
    power: ref('power'),
    headers: { type: 'array', minItems: 1, items: ref('header'), description: 'steam headers' },
    boilers: list('boiler', 'fired boilers'),
    heat_recovery_boilers: list('heatRecoveryBoiler', 'waste-heat boilers'),
    steam_imports: list('steamImport', 'purchased steam'),
    turbines: list('turbine', 'steam turbines'),
    letdowns: list('letdown', 'letdown stations'),
    users: list('user', 'process steam users'),
    flash_tanks: list('flashTank', 'flash tanks'),
    deaerator: ref('deaerator'),
    machines: list('machine', 'machines turbines may drive'),
    absorption_chillers: list('absorptionChiller', 'chilled-water plants with absorption chillers on steam'),
    steam_traps: list('trapGroup', 'a steam trap survey, one group per header'),
    insulation_survey: list('insulationRepair', 'bare pipe found by an insulation survey, one entry per header'),
    costs: ref('costs'),
    objective: choice(['minimum_cost', 'minimum_fuel', 'maximum_power', 'minimum_co2'], 'what the optimiser minimises or maximises; default minimum_cost'),
    solver: ref('solver'),
    scenarios: list('scenario', 'seasons and production cases, each an overlay with its hours per year'),
    projects: list('project', 'projects evaluated against every scenario'),
    sweeps: list('sweep', 'one value varied over a range'),
    meters: list('meter', 'flow meters and thermometers, for steamwright reconcile'),
    profile: ref('profile'),
  }, ['format_version', 'name', 'site', 'power', 'headers', 'deaerator']),
  $defs: defs,
};
