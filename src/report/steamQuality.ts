// Steam quality at every header: wet headers and floating headers with too
// little superheat, in the case's units.
import type { HeaderResult } from '../plant/index.js';
import { formatQuantity } from '../units/index.js';
import type { DisplayFormat } from './displayFormat.js';

/**
 * Superheat a floating header should keep, K: common practice, no source. A
 * header at or near saturation condenses steam in its lines with any heat
 * loss, so planners keep some margin; 10 K (18 degF) is a usual figure.
 */
export const SUPERHEAT_MARGIN_K = 10;

/** Moisture below this share is read as dry saturated steam (round-off of the mixing). */
const DRY = 1e-4;

type HeaderSteam = Pick<HeaderResult, 'id' | 'state' | 'quality' | 'superheat_K'>;

function moisture(header: HeaderSteam): number {
  return header.quality === null ? 0 : 1 - header.quality;
}

/** "superheat 38 degF", "dry saturated" or "wet, x 0.955 (4.5 % moisture)". */
export function steamQualityCell(header: HeaderSteam, format: DisplayFormat): string {
  if (moisture(header) > DRY) return `wet, x ${header.quality!.toFixed(3)} (${(moisture(header) * 100).toFixed(1)} % moisture)`;
  if (header.superheat_K !== null && header.superheat_K > 1e-6) return `superheat ${formatQuantity(header.superheat_K, 'temperatureDifference', format.system)}`;
  return 'dry saturated';
}

/** One sentence per header that is wet, or floating with less superheat than the margin. */
export function steamQualityWarnings(headers: readonly HeaderSteam[], format: DisplayFormat): string[] {
  const margin = formatQuantity(SUPERHEAT_MARGIN_K, 'temperatureDifference', format.system);
  const warnings: string[] = [];
  for (const header of headers) {
    if (moisture(header) > DRY) {
      warnings.push(`${header.id} is wet: ${(moisture(header) * 100).toFixed(1)} % moisture (x ${header.quality!.toFixed(3)}); users and turbines on it get wet steam and its lines collect condensate`);
    } else if (header.state === 'floating' && (header.superheat_K ?? 0) < SUPERHEAT_MARGIN_K) {
      const superheat = formatQuantity(header.superheat_K ?? 0, 'temperatureDifference', format.system);
      warnings.push(`${header.id} floats with ${superheat} of superheat, less than the ${margin} margin common practice keeps (no single source); a little heat loss makes it wet`);
    }
  }
  return warnings;
}
