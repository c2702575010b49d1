import type { Knex } from 'knex';
import type { ChecklistItem, MachineCategory } from '@chuckkey/core';
import { checklistItemId } from '@chuckkey/core';
import { createTraining } from '../factories';

const items = (...labels: string[]): ChecklistItem[] => labels.map((label) => ({ id: checklistItemId(label), label }));

export const GENERAL_SAFETY = 'General shop safety';

/**
 * The demo shop's trainings: what an instructor watches a member do before signing them off.
 * Common practice in metal shops, no published source; each shop's own rules and in-person
 * training come first.
 */
export const demoTrainings: { name: string; description: string; validityMonths: number; checklist: ChecklistItem[]; categories: MachineCategory[] }[] = [
  {
    name: GENERAL_SAFETY,
    description: 'The walk-through every member takes first: exits, emergency stops, protective gear and how the shop is kept.',
    validityMonths: 12,
    categories: ['lathe', 'mill', 'drill_press', 'mig_welder', 'tig_welder', 'band_saw', 'surface_grinder'],
    checklist: items(
      'Shows the emergency stops, fire extinguishers, eyewash station and first-aid kit',
      'Wears safety glasses and closed-toe shoes whenever in the shop',
      'Keeps loose clothing, jewellery and long hair away from moving machinery',
      'Tags out a broken machine and tells a supervisor instead of working around it',
      'Clears chips with a brush or hook, never bare hands or compressed air',
    ),
  },
  {
    name: 'Metal lathe fundamentals',
    description: 'Work holding, speeds, facing and turning on the engine lathes.',
    validityMonths: 24,
    categories: ['lathe'],
    checklist: items(
      'Removes the chuck key every time, before starting the spindle',
      'Holds the work securely and turns the chuck by hand to check it clears',
      'Sets a spindle speed that suits the stock diameter and material',
      'Faces and turns a part to size within 0.1 mm',
      'Keeps hands off rotating work and clears chips with the spindle stopped',
      'Stops the lathe with the emergency stop or the brake without looking for it',
    ),
  },
  {
    name: 'Milling fundamentals',
    description: 'Vise set-up, cutters, speeds and feeds on the knee mill.',
    validityMonths: 24,
    categories: ['mill'],
    checklist: items(
      'Clamps the vise and the work securely, with parallels seated',
      'Mounts the cutter in a collet or holder and tightens the drawbar, then removes the wrench',
      'Sets speed and feed for the cutter and the material',
      'Locks the axes that are not moving',
      'Keeps hands clear of the cutter and clears chips with the spindle stopped',
    ),
  },
  {
    name: 'Drill press',
    description: 'Clamping, speeds and safe drilling on the pillar drill.',
    validityMonths: 0,
    categories: ['drill_press'],
    checklist: items(
      'Clamps the work or holds it in a drill press vise, never by hand',
      'Removes the chuck key before starting',
      'Sets the speed for the drill size and the material',
      'Clears chips with a brush with the spindle stopped',
    ),
  },
  {
    name: 'MIG welding',
    description: 'Set-up, protective gear, ventilation and fire safety for the MIG welders.',
    validityMonths: 12,
    categories: ['mig_welder'],
    checklist: items(
      'Checks the cylinder is chained, then the regulator, hose and gun',
      'Wears a welding helmet with a suitable shade, gloves and a flame-resistant jacket',
      'Turns on the fume extraction and clears anything that burns from the area',
      'Attaches the work clamp close to the weld on clean metal',
      'Runs a fillet weld on a T-joint with full fusion',
      'Closes the cylinder valve and hangs up the gun and leads',
    ),
  },
  {
    name: 'TIG welding',
    description: 'Tungsten preparation, settings and bead control on the TIG welder.',
    validityMonths: 12,
    categories: ['tig_welder'],
    checklist: items(
      'Grinds the tungsten lengthwise on the wheel kept for tungsten',
      'Sets the current and polarity for steel and for aluminium',
      'Wears helmet, gloves and jacket and puts up screens for people passing by',
      'Runs a steady bead on a butt joint, feeding filler without touching the tungsten',
      'Closes the gas and lets the torch cool before hanging it up',
    ),
  },
  {
    name: 'Band saw',
    description: 'Blade choice and safe cutting on the horizontal and vertical band saws.',
    validityMonths: 0,
    categories: ['band_saw'],
    checklist: items(
      'Picks a blade pitch and speed that suit the material',
      'Clamps the stock in the vise before cutting on the horizontal saw',
      'Lowers the blade guide close to the work',
      'Keeps fingers out of the blade line and uses a push stick on the vertical saw',
    ),
  },
  {
    name: 'Surface grinder',
    description: 'Wheel care, work holding and light passes on the surface grinder.',
    validityMonths: 24,
    categories: ['surface_grinder'],
    checklist: items(
      'Ring-tests a wheel before mounting it and keeps the guard in place',
      'Stands to the side of the wheel when starting it',
      'Checks the magnetic chuck holds the work, and demagnetises the part after',
      'Dresses the wheel with the diamond',
      'Takes light passes with the dust extraction or coolant on',
    ),
  },
];

// Defers to the shop: the station shows this last, after the usual cautions.
const SHOP_RULES = "I follow this shop's posted rules for this machine and ask a supervisor when unsure";

const rotatingWork = [
  'Safety glasses on',
  'No gloves, loose sleeves or jewellery near the spindle',
  'Long hair tied back and tucked in',
];
const welding = [
  'Welding helmet on, with a suitable shade lens',
  'Welding gloves and a flame-resistant jacket on; no synthetic clothing',
  'Fume extraction on, or the area well ventilated',
  'Fire extinguisher at hand, and a fire watch arranged for hot work near anything that burns',
  'Area clear of flammables, and screens up for people passing by',
];

/**
 * The cautions each station shows before a session. Common practice, no published source;
 * they do not replace the shop's own rules, local codes or in-person training.
 */
export const demoSafetyChecklists: Record<MachineCategory, ChecklistItem[]> = {
  lathe: items(...rotatingWork, 'Chuck key removed from the chuck', 'Chuck guard and covers in place', 'Work held tight and clear of the carriage', SHOP_RULES),
  mill: items(...rotatingWork, 'Drawbar tight and wrench removed', 'Vise and work clamped tight', 'Chip guard in place', SHOP_RULES),
  drill_press: items(...rotatingWork, 'Chuck key removed from the chuck', 'Work clamped or in a vise, not held by hand', SHOP_RULES),
  mig_welder: items(...welding, SHOP_RULES),
  tig_welder: items(...welding, 'Tungsten ground and torch cap tight', SHOP_RULES),
  band_saw: items(
    'Safety glasses on',
    'No gloves or loose sleeves near the blade',
    'Blade guide lowered close to the work',
    'Work clamped, or fed with a push stick; fingers out of the blade line',
    SHOP_RULES,
  ),
  surface_grinder: items(
    'Safety glasses and a face shield on',
    'Wheel guard in place, and the wheel ring-tested when it was mounted',
    'Standing to the side of the wheel when starting it',
    'Work held on the magnetic chuck, with the chuck switched on',
    'Dust extraction or coolant on',
    SHOP_RULES,
  ),
};

export async function seed(knex: Knex): Promise<void> {
  const machines = await knex<{ id: string; category: MachineCategory }>('machines').select('id', 'category');
  for (const category of Object.keys(demoSafetyChecklists) as MachineCategory[]) {
    await knex('machines').where({ category }).update({ safety_checklist: JSON.stringify(demoSafetyChecklists[category]) });
  }
  for (const training of demoTrainings) {
    await createTraining(knex, {
      name: training.name,
      description: training.description,
      checklist: training.checklist,
      validity_months: training.validityMonths,
      machine_ids: machines.filter((m) => training.categories.includes(m.category)).map((m) => m.id),
    });
  }
}
