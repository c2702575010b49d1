export type MachineKind = 'rotating' | 'welding';

const welding = new Set(['mig_welder', 'tig_welder']);
const chucked = new Set(['lathe', 'mill', 'drill_press']);

export function machineKind(category: string): MachineKind {
  return welding.has(category) ? 'welding' : 'rotating';
}

/**
 * The usual cautions for the kind of machine, shown beside the machine's own checklist. They
 * are common practice in metal shops, not a published standard, and never replace the shop's
 * rules, local codes or in-person training: the screen says so under them.
 */
export function machineCautions(category: string): string[] {
  if (machineKind(category) === 'welding') {
    return [
      'Welding helmet down with the right shade, and dry welding gloves on.',
      'Fume extraction or ventilation running before you strike an arc.',
      'Fire watch: flammables cleared away, and someone keeps watch after you finish.',
      'Screens up, so no one nearby is flashed.',
    ];
  }
  return [
    'Eye protection on.',
    'No gloves, loose sleeves, jewellery or loose hair near the turning work or cutter.',
    ...(chucked.has(category) ? ['Take the chuck key out of the chuck before you start the spindle.'] : []),
    'Hands clear, and the machine stopped before you measure or clear chips.',
  ];
}
