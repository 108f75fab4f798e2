// Drives: a machine whose case gives an alternative drive (so it has both, the
// installed one and the other) gets the swap as a measure: a back-pressure
// turbine in place of its motor, where steam let down through the turbine is
// cheaper than the electricity, or a motor in place of its turbine, where the
// steam is worth more than the power. The solve says which; both are offered
// when the case gives them.
import type { Plant } from '../model/index.js';
import type { Measure } from './measureTypes.js';
import { percent } from './quantities.js';
import { NEW_TURBINE } from './turbineMeasures.js';

export function driveMeasures(plant: Plant): Measure[] {
  const costs = plant.costs!;
  const currency = plant.site.currency;
  const common = { lifeYears: costs.lifeYears, discountRate: costs.discountRate, fixedOmPerYear: 0, cause: null, ways: [], alternativeOf: null };
  return plant.machines.flatMap((machine): Measure[] => {
    const alternative = machine.alternativeDrive;
    const kW = machine.shaftPower;
    if (alternative?.kind === 'turbine' && machine.motor && machine.turbine === null) {
      const id = `turbine_drive_${machine.id}`;
      return [{
        ...common,
        id,
        kind: 'turbineDrive',
        title: `steam turbine drive in place of the motor of ${machine.id}`,
        change: `a back-pressure turbine from ${alternative.from} to ${alternative.to} (${percent(alternative.isentropicEfficiency)} isentropic) drives ${machine.id} (${Math.round(kW)} kW shaft) in place of its motor; the motor's electricity is no longer bought, the turbine's steam goes on to ${alternative.to}`,
        touches: [machine.id, alternative.from, alternative.to],
        capital: kW * costs.turbineDrivePerKW,
        capitalBasis: `${Math.round(kW)} kW of shaft at ${Math.round(costs.turbineDrivePerKW)} ${currency}/kW (costs.turbine_drive)`,
        changes: {
          machines: [{ id: machine.id, motor_efficiency: null, alternative_drive: null }],
          add: {
            turbines: [{
              id,
              name: `Turbine drive of ${machine.id}`,
              inlet: alternative.from,
              stages: [{ to: alternative.to, isentropic_efficiency: percent(alternative.isentropicEfficiency) }],
              mechanical_efficiency: percent(NEW_TURBINE.mechanical),
              can_switch_off: false,
              drives: machine.id,
            }],
          },
        },
      }];
    }
    if (alternative?.kind === 'motor' && machine.motor === null && machine.turbine !== null) {
      return [{
        ...common,
        id: `motor_drive_${machine.id}`,
        kind: 'motorDrive',
        title: `electric motor in place of turbine ${machine.turbine} on ${machine.id}`,
        change: `a motor (${percent(alternative.efficiency)} efficient) drives ${machine.id} (${Math.round(kW)} kW shaft) in place of turbine ${machine.turbine}, which is taken out: its steam is no longer raised and its electricity is bought`,
        touches: [machine.id, machine.turbine],
        capital: kW * costs.motorDrivePerKW,
        capitalBasis: `${Math.round(kW)} kW of shaft at ${Math.round(costs.motorDrivePerKW)} ${currency}/kW (costs.motor_drive)`,
        changes: {
          machines: [{ id: machine.id, motor_efficiency: percent(alternative.efficiency), alternative_drive: null }],
          disable: [machine.turbine],
        },
      }];
    }
    return [];
  });
}
