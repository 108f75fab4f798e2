// Small invented plants for the optimiser's tests, written in the case format.
import { loadCaseText, type Plant } from '../../../src/model/index.js';
import { caseOpening } from '../../helpers/caseText.js';

export interface SmallPlant {
  boilerMax?: string;
  boilerEfficiency?: string;
  userSteam?: string;
  returnPercent?: number;
  condensateTemperature?: string;
  letdown?: boolean;
  extra?: string;
}

/** One header at 10 barg (two with a letdown), one boiler, one user, a deaerator. */
export function smallCase(options: SmallPlant = {}): string {
  const letdown = options.letdown ?? false;
  const user = `  - id: u1
    header: ${letdown ? 'low' : 'main'}
    steam: ${options.userSteam ?? '20 t/h'}
    condensate: { return: ${options.returnPercent ?? 0} %${options.returnPercent ? `, temperature: ${options.condensateTemperature ?? '90 degC'}, to: deaerator` : ''} }`;
  return `${caseOpening({ name: 'Test plant' })}power:
  site_demand: 0 kW
  import: { price: 100 USD/MWh, max: 10 MW }
  export: { price: 0 USD/MWh, max: 0 MW }
headers:
  - id: main
    pressure: ${letdown ? '40 barg' : '10 barg'}
    state: ${letdown ? 'controlled\n    temperature: 400 degC' : 'floating'}
    venting: forbidden
${letdown ? '  - { id: low, pressure: 10 barg, state: floating, venting: forbidden }\n' : ''}boilers:
  - id: b1
    header: main
    fuels: [gas]
    steam: { min: 0 t/h, max: ${options.boilerMax ?? '50 t/h'} }
    outlet_temperature: ${letdown ? '420 degC' : 'saturated'}
    efficiency: [{ load: 100 %, efficiency: ${options.boilerEfficiency ?? '80 %'} }]
    blowdown: 0 %
    can_switch_off: false
${letdown ? `letdowns:
  - id: prv
    from: main
    to: low
    capacity: 100 t/h
    desuperheater: { target_temperature: 220 degC, spray_water: feedwater }
` : ''}users:
${user}
deaerator:
  pressure: 0.2 barg
  heating_steam: ${letdown ? 'low' : 'main'}
  vent: 0 %
${options.extra ?? ''}objective: minimum_cost
`;
}

export function loadPlant(text: string): Plant {
  const loaded = loadCaseText(text, 'test.yaml');
  if (!loaded.ok) throw new Error(`test case does not load:\n${loaded.issues.map((issue) => `${issue.line}:${issue.column} ${issue.path} ${issue.message}`).join('\n')}`);
  return loaded.plant;
}
