// The demo plants load cleanly, and the resolved plant is in SI as documented.
import { readFileSync } from 'node:fs';
import { expect, test } from 'vitest';
import { loadCase, loadCaseText } from '../../src/model/index.js';
import { expectClose } from '../helpers/expectClose.js';

const millPath = new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url);

test.each(['kestrel-bay-board-mill.yaml', 'millbrook-creamery.yaml', 'orchard-vale-foods.yaml'])('cases/%s loads with no errors or warnings', async (name) => {
  const result = await loadCase(new URL(`../../cases/${name}`, import.meta.url).pathname);
  expect(result.ok ? result.warnings : result.issues).toEqual([]);
});

test('each demo case carries the schema modeline with a relative path', () => {
  for (const name of ['kestrel-bay-board-mill.yaml', 'millbrook-creamery.yaml', 'orchard-vale-foods.yaml']) {
    const text = readFileSync(new URL(`../../cases/${name}`, import.meta.url), 'utf8');
    expect(text.split('\n')[0]).toBe('# yaml-language-server: $schema=../schema/case.schema.json');
  }
});

test('the resolved mill is in internal SI units', () => {
  const result = loadCaseText(readFileSync(millPath, 'utf8'), 'mill.yaml');
  if (!result.ok) throw new Error(result.issues[0].message);
  const { plant } = result;
  const hp = plant.headers.find((header) => header.id === 'hp')!;
  // 42 barg over the case's 101.3 kPa atmosphere: 4.2 + 0.1013 MPa abs.
  expectClose(hp.pressure, 4.3013, 1e-12);
  expect(hp.state).toMatchObject({ kind: 'controlled', specifiedBy: 'temperature', T: 673.15 });
  // 60 t/h = 60000 kg / 3600 s.
  expectClose(plant.boilers[0].steam.max, 60000 / 3600, 1e-12);
  // 112 EUR/MWh = 0.112 EUR/kWh; 7.5 MW = 7500 kW; 3 % = 0.03; cycles 25 -> 1/25.
  expectClose(plant.power.import.price, 0.112, 1e-12);
  expect(plant.power.siteDemand).toBe(7500);
  expectClose(plant.boilers[0].blowdownFraction, 0.03, 1e-12);
  expectClose(plant.boilers[1].blowdownFraction, 0.04, 1e-12);
  expect(plant.turbines[0].stages.map((stage) => stage.exhaust.kind)).toEqual(['header', 'condenser']);
  expect(plant.turbines[1].stages[0].performance).toEqual({ kind: 'willans', intercept: 60, slope: 150 });
  expect(plant.flashTanks.find((tank) => tank.id === 'blowdown_flash')!.receives).toEqual(['boiler_1', 'boiler_2']);
  expect(plant.users.find((user) => user.id === 'starch_cooker')!.demand).toEqual({ kind: 'duty', heat: 2400 });
});
