import type { MachineCategory } from '@chuckkey/core';

/**
 * The cautions a machinist expects to confirm before starting, by kind of machine: common
 * practice of machine shops and training manuals (29 CFR 1910.212 guarding, 1910.252 welding,
 * ANSI Z87.1 eye protection), offered as a start; each shop's own rules come first.
 */
export const usualSafetyItems: Record<MachineCategory, string[]> = {
  lathe: [
    'Eye protection on',
    'No gloves, loose sleeves, jewellery or untied long hair near the work',
    'Chuck key removed from the chuck',
    'Work held tight; tool post and tailstock locked',
  ],
  mill: [
    'Eye protection on',
    'No gloves, loose sleeves, jewellery or untied long hair near the cutter',
    'Work clamped or held in the vise, vise bolted down',
    'Drawbar tight and wrench removed',
  ],
  mig_welder: [
    'Welding helmet with the right shade, and welding gloves on',
    'Flame-resistant clothing, no synthetic fabric',
    'Ventilation or fume extraction running',
    'Flammables cleared from the area; fire watch and extinguisher at hand',
    'Gas cylinder chained upright',
  ],
  tig_welder: [
    'Welding helmet with the right shade, and welding gloves on',
    'Flame-resistant clothing, no synthetic fabric',
    'Ventilation or fume extraction running',
    'Flammables cleared from the area; fire watch and extinguisher at hand',
    'Gas cylinder chained upright',
  ],
  band_saw: [
    'Eye protection on',
    'Blade guard set just above the work',
    'Blade tension and tracking checked',
    'Work held with a vise or push stick, hands clear of the blade',
  ],
  drill_press: [
    'Eye protection on',
    'No gloves, loose sleeves, jewellery or untied long hair near the spindle',
    'Work clamped to the table, never held by hand',
    'Chuck key removed from the chuck',
  ],
  surface_grinder: [
    'Eye protection on',
    'Wheel ring-tested and guard in place',
    'Work held firmly on the magnetic chuck',
    'Stand to the side of the wheel when starting it',
  ],
};
