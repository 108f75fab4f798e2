// The diagram's symbols, drawn centred on (x, y) in a square of side `size`.
// Each kind differs in outline, not only in colour, so greyscale prints read.
import type { Glyph } from './diagramModel.js';

const INK = '#23303b';

export function glyphSvg(glyph: Glyph, x: number, y: number, size: number): string {
  const half = size / 2;
  const left = x - half;
  const top = y - half;
  const f = (value: number): string => value.toFixed(1);
  switch (glyph) {
    case 'boiler':
      // a drum: a box with a water line
      return `<rect class="g-boiler" x="${f(left)}" y="${f(top)}" width="${size}" height="${size}" rx="3" fill="#f1e3c8" stroke="${INK}" stroke-width="1.5"/><line x1="${f(left + 3)}" x2="${f(left + size - 3)}" y1="${f(y + 3)}" y2="${f(y + 3)}" stroke="${INK}" stroke-width="1.2"/>`;
    case 'heatRecovery':
      // a box with waste gas passing through (two diagonals)
      return `<rect class="g-hrb" x="${f(left)}" y="${f(top)}" width="${size}" height="${size}" rx="3" fill="#e6e0d2" stroke="${INK}" stroke-width="1.5"/><path d="M${f(left + 3)} ${f(y + 2)} L${f(x - 2)} ${f(top + 3)} M${f(x + 2)} ${f(top + size - 3)} L${f(left + size - 3)} ${f(y - 2)}" stroke="${INK}" stroke-width="1.2" fill="none"/>`;
    case 'import':
      return `<circle class="g-import" cx="${f(x)}" cy="${f(y)}" r="${f(half)}" fill="#e9eef2" stroke="${INK}" stroke-width="1.5"/><path d="M${f(x - 6)} ${f(y - 3)} L${f(x)} ${f(y + 5)} L${f(x + 6)} ${f(y - 3)}" stroke="${INK}" stroke-width="1.5" fill="none"/>`;
    case 'flashVapour':
      return `<path class="g-flash" d="M${f(x)} ${f(top + 2)} L${f(x + half - 2)} ${f(y)} L${f(x)} ${f(top + size - 2)} L${f(x - half + 2)} ${f(y)} Z" fill="#ffffff" stroke="${INK}" stroke-width="1.5"/>`;
    case 'spray':
    case 'heatingSteam':
      return `<circle class="g-small" cx="${f(x)}" cy="${f(y)}" r="${f(half / 2)}" fill="#ffffff" stroke="${INK}" stroke-width="1.5"/>`;
    case 'user':
      // a coil in a box: heat given up by the steam
      return `<rect class="g-user" x="${f(left)}" y="${f(top)}" width="${size}" height="${size}" rx="6" fill="#ffffff" stroke="${INK}" stroke-width="1.5"/><path d="M${f(x)} ${f(top)} L${f(x)} ${f(top + 4)} L${f(x + 6)} ${f(top + 7)} L${f(x - 6)} ${f(top + 11)} L${f(x + 6)} ${f(top + 15)} L${f(x - 6)} ${f(top + 19)} L${f(x)} ${f(top + size)}" stroke="${INK}" stroke-width="1.2" fill="none"/>`;
    case 'vent':
      // three stacked chevrons pointing up, heavy: steam leaving to air
      return `<g class="g-vent"><rect x="${f(left - 2)}" y="${f(top - 2)}" width="${size + 4}" height="${size + 4}" rx="4" fill="#fde7d9" stroke="#a4301c" stroke-width="2" stroke-dasharray="2 2"/><path d="M${f(x - 8)} ${f(y - 1)} L${f(x)} ${f(y - 8)} L${f(x + 8)} ${f(y - 1)} M${f(x - 8)} ${f(y + 4)} L${f(x)} ${f(y - 3)} L${f(x + 8)} ${f(y + 4)} M${f(x - 8)} ${f(y + 9)} L${f(x)} ${f(y + 2)} L${f(x + 8)} ${f(y + 9)}" stroke="#a4301c" stroke-width="2.2" fill="none" stroke-linecap="round"/></g>`;
    case 'turbine':
      // narrow at the inlet (top), wide at the exhaust (bottom)
      return `<path class="g-turbine" d="M${f(x - 5)} ${f(top)} L${f(x + 5)} ${f(top)} L${f(x + half)} ${f(top + size)} L${f(x - half)} ${f(top + size)} Z" fill="#dfe7dc" stroke="${INK}" stroke-width="1.5"/>`;
    case 'letdown':
      // a valve body: two triangles tip to tip
      return `<path class="g-letdown" d="M${f(x - 8)} ${f(top)} L${f(x + 8)} ${f(top)} L${f(x - 8)} ${f(top + size)} L${f(x + 8)} ${f(top + size)} Z" fill="#ffffff" stroke="${INK}" stroke-width="1.5" stroke-linejoin="round"/>`;
    default:
      return `<rect class="g-other" x="${f(x - 5)}" y="${f(y - 5)}" width="10" height="10" fill="#ffffff" stroke="${INK}" stroke-width="1.5"/>`;
  }
}
