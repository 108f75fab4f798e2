// The cautions every balance report carries.
export const SAFETY_CAUTION = [
  'Planning estimate only, not a design. Before anything is built or changed: check relief capacity',
  'downstream of every letdown station for the full flow its valve can pass; guard against water hammer',
  'when condensate or wet-steam lines are brought into service; treat flash steam, vents and hot',
  'surfaces as burn hazards. The ASME Boiler and Pressure Vessel Code, ASME B31.1, local codes and',
  'licensed engineers govern all such work.',
].join('\n');
