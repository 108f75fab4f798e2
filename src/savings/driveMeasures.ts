// Drives: a machine or feedwater pump whose case gives an alternative drive
// (so it has both, the installed one and the other) gets the swap as a measure: a back-pressure
// turbine in place of its motor, where steam let down through the turbine is
// cheaper than the electricity, or a motor in place of its turbine, where the
// steam is worth more than the power. The solve says which; both are offered
// when the case gives them.
import type { AlternativeDrive, Plant } from '../model/index.js';
import type { Measure } from './measureTypes.js';
import { percent } from './quantities.js';
import { largest, unitValue, type SolvedRun } from './sizing.js';
import { NEW_TURBINE } from './turbineMeasures.js';

/** A machine or feedwater pump with a drive the case says it could have in place of its own. */
interface Driven {
  id: string;
  what: string;
  motor: { efficiency: number } | null;
  turbine: string | null;
  alternative: AlternativeDrive;
  /** shaft power the drive is sized for, kW */
  kW: number;
  sizing: string;
  /** the overlay that changes the item's own drive fields */
  own: (fields: Record<string, unknown>) => Record<string, unknown>;
}

export function driveMeasures(plant: Plant, runs: readonly SolvedRun[] = []): Measure[] {
  const driven: Driven[] = [
    ...plant.machines.flatMap((machine): Driven[] => (machine.alternativeDrive ? [{
      id: machine.id,
      what: machine.id,
      motor: machine.motor,
      turbine: machine.turbine,
      alternative: machine.alternativeDrive,
      kW: machine.shaftPower,
      sizing: 'shaft',
      own: (fields) => ({ machines: [{ id: machine.id, ...fields }] }),
    }] : [])),
    ...plant.deaerator.feedwaterPumps.flatMap((pump): Driven[] => {
      if (!pump.alternativeDrive) return [];
      // Sized for the whole feedwater duty at the scenarios' largest, as a pump that may carry it alone.
      const kW = largest(runs, (run) => unitValue(run, 'deaerator', 'pump_shaft_kW'));
      return [{
        id: pump.id,
        what: `feedwater pump ${pump.id}`,
        motor: pump.motor,
        turbine: pump.turbine,
        alternative: pump.alternativeDrive,
        kW,
        sizing: 'shaft, the largest feedwater pumping over the scenarios,',
        own: (fields) => ({ deaerator: { feedwater_pumps: [{ id: pump.id, ...fields }] } }),
      }];
    }),
  ];
  return driven.flatMap((item) => measureFor(plant, item));
}

function measureFor(plant: Plant, item: Driven): Measure[] {
  const costs = plant.costs!;
  const currency = plant.site.currency;
  const common = { lifeYears: costs.lifeYears, discountRate: costs.discountRate, fixedOmPerYear: 0, cause: null, ways: [], alternativeOf: null };
  const { alternative, kW } = item;
  if (alternative.kind === 'turbine' && item.motor && item.turbine === null) {
    const id = `turbine_drive_${item.id}`;
    return [{
      ...common,
      id,
      kind: 'turbineDrive',
      title: `steam turbine drive in place of the motor of ${item.what}`,
      change: `a back-pressure turbine from ${alternative.from} to ${alternative.to} (${percent(alternative.isentropicEfficiency)} isentropic) drives ${item.what} (${Math.round(kW)} kW shaft) in place of its motor; the motor's electricity is no longer bought, the turbine's steam goes on to ${alternative.to}`,
      touches: [item.id, alternative.from, alternative.to],
      capital: kW * costs.turbineDrivePerKW,
      capitalBasis: `${Math.round(kW)} kW of ${item.sizing} at ${Math.round(costs.turbineDrivePerKW)} ${currency}/kW (costs.turbine_drive)`,
      changes: {
        ...item.own({ motor_efficiency: null, alternative_drive: null }),
        add: {
          turbines: [{
            id,
            name: `Turbine drive of ${item.what}`,
            inlet: alternative.from,
            stages: [{ to: alternative.to, isentropic_efficiency: percent(alternative.isentropicEfficiency) }],
            mechanical_efficiency: percent(NEW_TURBINE.mechanical),
            can_switch_off: false,
            drives: item.id,
          }],
        },
      },
    }];
  }
  if (alternative.kind === 'motor' && item.motor === null && item.turbine !== null) {
    return [{
      ...common,
      id: `motor_drive_${item.id}`,
      kind: 'motorDrive',
      title: `electric motor in place of turbine ${item.turbine} on ${item.what}`,
      change: `a motor (${percent(alternative.efficiency)} efficient) drives ${item.what} (${Math.round(kW)} kW shaft) in place of turbine ${item.turbine}, which is taken out: its steam is no longer raised and its electricity is bought`,
      touches: [item.id, item.turbine],
      capital: kW * costs.motorDrivePerKW,
      capitalBasis: `${Math.round(kW)} kW of ${item.sizing} at ${Math.round(costs.motorDrivePerKW)} ${currency}/kW (costs.motor_drive)`,
      changes: {
        ...item.own({ motor_efficiency: percent(alternative.efficiency), alternative_drive: null }),
        disable: [item.turbine],
      },
    }];
  }
  return [];
}
