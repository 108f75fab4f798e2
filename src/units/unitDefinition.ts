/**
 * One unit: internal value = (value + zero) x factor, plus the atmospheric
 * pressure for gauge units. The offset sits before the scale so that degF
 * converts as (F + 459.67) x 5/9, the form the definition is written in.
 */
export interface UnitDefinition {
  /** Canonical spelling: used in results, messages and display. */
  readonly name: string;
  /** Other accepted spellings of the same unit. */
  readonly aliases: readonly string[];
  /** Internal units per unit. */
  readonly factor: number;
  /** Added before scaling (temperature scales with a shifted zero). */
  readonly zero?: number;
  /** For gauge pressures: the absolute unit that atmospheric pressure is shown in. */
  readonly gaugeOf?: string;
}

export function unit(name: string, factor: number, aliases: readonly string[] = []): UnitDefinition {
  return { name, aliases, factor };
}

export function offsetUnit(name: string, factor: number, zero: number, aliases: readonly string[] = []): UnitDefinition {
  return { name, aliases, factor, zero };
}

export function gaugeUnit(name: string, factor: number, absoluteName: string, aliases: readonly string[] = []): UnitDefinition {
  return { name, aliases, factor, gaugeOf: absoluteName };
}

export function toInternal(definition: UnitDefinition, value: number, atmosphericPressure_MPa: number): number {
  const gaugeShift = definition.gaugeOf === undefined ? 0 : atmosphericPressure_MPa;
  return (value + (definition.zero ?? 0)) * definition.factor + gaugeShift;
}

export function fromInternal(definition: UnitDefinition, valueSI: number, atmosphericPressure_MPa: number): number {
  const gaugeShift = definition.gaugeOf === undefined ? 0 : atmosphericPressure_MPa;
  return (valueSI - gaugeShift) / definition.factor - (definition.zero ?? 0);
}
