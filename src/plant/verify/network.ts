// Letdowns, users, flash tanks, the deaerator and the headers, as the audit
// sees them: throttling, spray, condensing, flashing and mixing.
import type { Plant } from '../../model/index.js';
import { saturatedLiquid, saturatedVapour, statePT } from '../../properties/index.js';
import { liquidAt, point, pointPH, type AuditStates } from './auditStates.js';
import type { Ledger } from './ledger.js';
import type { SolvedPlant } from './solvedPlant.js';
import { find, liquidTarget } from './supplies.js';
import { ATMOSPHERE, BALANCE_TOLERANCE, DRAIN, MAKEUP } from './tolerances.js';

type Attempt = (id: string, work: () => void) => void;

/**
 * A letdown throttles (h unchanged) and, with a desuperheater, sprays water to
 * its target: m_w = m (h_in - h_t) / (h_t - h_w) when the steam is hotter.
 */
export function auditLetdowns(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: Attempt): void {
  for (const letdown of plant.letdowns) {
    ledger.volume(letdown.id, 'letdown');
    attempt(letdown.id, () => {
      const result = find(solved.letdowns, letdown.id);
      const inlet = states.header(letdown.from);
      const outletPressure = states.headerPressure(letdown.to);
      ledger.stream({ from: letdown.from, to: letdown.id, label: 'steam', m: result.steam, ...inlet });
      let outletH = inlet.h;
      let expectedSpray = 0;
      const desuperheater = letdown.desuperheater;
      if (desuperheater) {
        const target = statePT(outletPressure, desuperheater.targetTemperature).h;
        const water = desuperheater.water === 'feedwater' ? states.feedwater : states.makeup;
        if (inlet.h > target) {
          outletH = target;
          expectedSpray = (result.steam * (inlet.h - target)) / (target - water.h);
        }
        if (result.spray > 0 || expectedSpray > 0) {
          ledger.stream({ from: desuperheater.water === 'feedwater' ? 'deaerator' : MAKEUP, to: letdown.id, label: 'spray water', m: result.spray, ...water });
        }
      }
      // The loop linearises spray about the last pass's inlet state and flow; it stops once header
      // states move less than solver.enthalpy_tolerance, so the spray can be off by about that share
      // of the superheat it removes (a second-order term, measured at 1.3e-6 on the board mill).
      const superheatRemoved = Math.max(inlet.h - outletH, 1e-9);
      const sprayTolerance = Math.max(BALANCE_TOLERANCE, expectedSpray > 0 ? plant.solver.enthalpyTolerance / superheatRemoved : 0);
      ledger.check(letdown.id, 'spray water', expectedSpray, result.spray, 'kg/s', sprayTolerance, 1e-6 * letdown.capacity);
      ledger.stream({ from: letdown.id, to: letdown.to, label: 'steam', m: result.outlet, ...pointPH(outletPressure, outletH) });
    });
  }
}

/**
 * A user condenses its steam to its condensate temperature; the heat goes to
 * the process, taken to receive it at the condensate temperature (the coldest
 * the steam side reaches, so the entropy figure is never too high).
 */
export function auditUsers(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: Attempt): void {
  for (const user of plant.users) {
    ledger.volume(user.id, 'user', false);
    attempt(user.id, () => {
      const result = find(solved.users, user.id);
      const steam = states.header(user.header);
      const condensate = liquidAt(steam.p, user.condensate.temperature);
      const returned = result.steam * user.condensate.returnFraction;
      ledger.stream({ from: user.header, to: user.id, label: 'steam', m: result.steam, ...steam });
      if (returned !== 0) ledger.stream({ from: user.id, to: liquidTarget(user.condensate.to), label: 'condensate', m: returned, ...condensate });
      if (result.steam - returned !== 0) ledger.stream({ from: user.id, to: DRAIN, label: 'condensate lost', m: result.steam - returned, ...condensate });
      const heat = result.steam * (steam.h - condensate.h);
      // A negative draw exists only in plants built in code (probes of marginal values): its heat
      // comes from a source at a temperature nobody states, so it adds no entropy term.
      ledger.cross({ volume: user.id, kind: 'heat', direction: 'out', kW: heat, temperature: result.steam >= 0 ? condensate.T : null });
      if (user.demand.kind === 'duty') {
        // The loop stops once header states move less than solver.enthalpy_tolerance; a duty
        // user's steam was sized at the last state, so its heat can be off by that share of its drop.
        const tolerance = Math.max(BALANCE_TOLERANCE, plant.solver.enthalpyTolerance / (steam.h - condensate.h));
        ledger.check(user.id, 'heat delivered', user.demand.heat, heat, 'kW', tolerance, 1e-3);
      }
      else ledger.check(user.id, 'steam', user.demand.massFlow, result.steam, 'kg/s', BALANCE_TOLERANCE, 1e-6);
    });
  }
}

/**
 * A flash tank splits what enters into saturated vapour and liquid at its
 * pressure; liquid that arrives below saturation leaves as it came, mixed.
 * Tanks are taken from high to low pressure, so a tank's inflows are known.
 */
export function auditFlashTanks(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: Attempt): void {
  const tanks = [...plant.flashTanks].sort((a, b) => b.pressure - a.pressure);
  for (const tank of tanks) {
    ledger.volume(tank.id, 'flashTank');
    attempt(tank.id, () => {
      const result = find(solved.flashTanks, tank.id);
      const inflows = ledger.into(tank.id);
      const mass = inflows.reduce((total, stream) => total + stream.m, 0);
      const mixed = mass > 0 ? inflows.reduce((total, stream) => total + stream.m * stream.h, 0) / mass : -Infinity;
      const liquid = point(saturatedLiquid(tank.pressure));
      const vapour = point(saturatedVapour(tank.pressure));
      const leaving = mixed > liquid.h ? liquid : mass > 0 ? pointPH(tank.pressure, mixed) : liquid;
      ledger.stream({ from: tank.id, to: tank.vapourTo.kind === 'header' ? tank.vapourTo.id : ATMOSPHERE, label: 'flash vapour', m: result.vapour, ...vapour });
      const preheater = tank.makeupPreheater;
      if (!preheater || tank.liquidTo.kind !== 'drain') {
        ledger.stream({ from: tank.id, to: liquidTarget(tank.liquidTo), label: 'flash liquid', m: result.liquid, ...leaving });
        return;
      }
      // The makeup preheater: the liquid leaves cooler by the heat it gives the makeup.
      const heat = result.makeupHeat;
      const cooled = result.liquid > 1e-12 ? pointPH(tank.pressure, leaving.h - heat / result.liquid) : leaving;
      ledger.stream({ from: tank.id, to: DRAIN, label: 'flash liquid, cooled', m: result.liquid, ...cooled });
      ledger.check(tank.id, 'preheater heat at most what cools the liquid to its leaving temperature', Math.min(heat, result.liquid * Math.max(0, leaving.h - preheater.leavingH)), heat, 'kW', BALANCE_TOLERANCE, 1);
      const makeupH = states.makeup.h;
      ledger.check(tank.id, 'preheater heat at most what warms the makeup to the liquid\'s temperature', Math.min(heat, solved.deaerator.makeup * Math.max(0, leaving.h - makeupH)), heat, 'kW', BALANCE_TOLERANCE, 1);
      if (heat > 0) {
        // Heat leaves the liquid at its mean temperature (dh / ds) and enters the
        // makeup at the makeup's mean temperature while warming: the exchanger's
        // entropy generation is the difference, >= 0 when heat flows downhill.
        const hotMean = Math.abs(leaving.s - cooled.s) > 1e-12 ? (leaving.h - cooled.h) / (leaving.s - cooled.s) : leaving.T;
        const warmed = pointPH(states.makeup.p, makeupH + heat / Math.max(solved.deaerator.makeup, 1e-12));
        const coldMean = Math.abs(warmed.s - states.makeup.s) > 1e-12 ? (warmed.h - makeupH) / (warmed.s - states.makeup.s) : states.makeup.T;
        ledger.cross({ volume: tank.id, kind: 'heat', direction: 'out', kW: heat, temperature: hotMean });
        ledger.cross({ volume: 'deaerator', kind: 'heat', direction: 'in', kW: heat, temperature: coldMean });
      }
    });
  }
}

/** The deaerator: heating steam and makeup in, its vent out; returns and feedwater are declared by the units they join. */
export function auditDeaerator(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: Attempt): void {
  const deaerator = plant.deaerator;
  ledger.volume('deaerator', 'deaerator');
  attempt('deaerator', () => {
    const result = solved.deaerator;
    ledger.stream({ from: deaerator.heatingSteam, to: 'deaerator', label: 'heating steam', m: result.heatingSteam, ...states.header(deaerator.heatingSteam) });
    ledger.stream({ from: MAKEUP, to: 'deaerator', label: 'makeup', m: result.makeup, ...states.makeup });
    ledger.stream({ from: 'deaerator', to: ATMOSPHERE, label: 'vent', m: result.vent, ...states.deaeratorVapour });
  });
}

/** Checked after every unit has declared its streams: the vent is at least its design share of the water leaving. */
export function auditDeaeratorVent(plant: Plant, solved: SolvedPlant, ledger: Ledger): void {
  const water = ledger.outOf('deaerator').filter((stream) => stream.to !== ATMOSPHERE).reduce((total, stream) => total + stream.m, 0);
  const least = plant.deaerator.ventFraction * water;
  ledger.check('deaerator', 'vent at least its design share', Math.max(least, solved.deaerator.vent), solved.deaerator.vent, 'kg/s', BALANCE_TOLERANCE, 1e-6);
}

/** Headers: the vent, the spray that holds a controlled header, and the heat lost to ambient. */
export function auditHeaders(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: Attempt): void {
  for (const header of plant.headers) {
    ledger.volume(header.id, 'header');
    attempt(header.id, () => {
      const result = find(solved.headers, header.id);
      const state = states.header(header.id);
      if (header.state.kind === 'controlled') {
        ledger.check(header.id, 'enthalpy at the set point', state.h, result.h, 'kJ/kg', BALANCE_TOLERANCE, 1);
        if (result.spray > 0) ledger.stream({ from: 'deaerator', to: header.id, label: 'spray water', m: result.spray, ...states.feedwater });
      }
      if (result.vent > 0) ledger.stream({ from: header.id, to: ATMOSPHERE, label: 'vent', m: result.vent, ...state });
      if (header.heatLoss > 0) ledger.cross({ volume: header.id, kind: 'heat', direction: 'out', kW: header.heatLoss, temperature: states.ambient });
    });
  }
}
