// A short text summary of a resolved plant: units per kind and the headers.
import { formatQuantity } from '../units/index.js';
import type { Header, Plant } from './plantTypes.js';

function count(number: number, singular: string, plural = `${singular}s`): string | null {
  return number === 0 ? null : `${number} ${number === 1 ? singular : plural}`;
}

function headerLine(plant: Plant, header: Header, width: number): string {
  const options = { atmosphericPressure_MPa: plant.site.atmosphericPressure, digits: 4 };
  const system = plant.site.unitSystem;
  const pressure = formatQuantity(header.pressure, 'pressure', system, options);
  const saturation = formatQuantity(header.saturationTemperature, 'temperature', system, options);
  const state = header.state.kind === 'floating'
    ? 'floating'
    : header.state.specifiedBy === 'temperature'
      ? `controlled at ${formatQuantity(header.state.T, 'temperature', system, options)}`
      : `controlled at ${formatQuantity(header.state.h, 'specificEnthalpy', system, options)}`;
  const venting = header.venting ? ', venting allowed' : '';
  return `  ${header.id.padEnd(width)}  ${pressure.padStart(11)}  saturation ${saturation.padStart(9)}  ${state}${venting}`;
}

/** Lines such as "3 headers, 2 boilers, ..." then one line per header. */
export function summarisePlant(plant: Plant): string[] {
  const kinds = [
    count(plant.headers.length, 'header'),
    count(plant.fuels.length, 'fuel'),
    count(plant.boilers.length, 'fired boiler'),
    count(plant.heatRecoveryBoilers.length, 'heat-recovery boiler'),
    count(plant.steamImports.length, 'steam import'),
    count(plant.turbines.length, 'turbine'),
    count(plant.letdowns.length, 'letdown'),
    count(plant.users.length, 'user'),
    count(plant.flashTanks.length, 'flash tank'),
    '1 deaerator',
    count(plant.deaerator.feedwaterPumps.length, 'feedwater pump'),
    count(plant.machines.length, 'machine'),
  ].filter((text): text is string => text !== null);
  const width = Math.max(...plant.headers.map((header) => header.id.length));
  const lines = [`${plant.name}: ${kinds.join(', ')}`, 'headers:', ...plant.headers.map((header) => headerLine(plant, header, width))];
  if (plant.scenarios.length > 0) {
    const hours = plant.scenarios.reduce((total, scenario) => total + scenario.hours, 0);
    lines.push(`scenarios: ${plant.scenarios.map((scenario) => `${scenario.id} (${scenario.hours.toLocaleString('en-US')} h)`).join(', ')}; ${hours.toLocaleString('en-US')} h a year in all`);
  }
  if (plant.projects.length > 0) lines.push(`projects: ${plant.projects.map((project) => project.id).join(', ')}`);
  return lines;
}
