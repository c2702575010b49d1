import { machineCategories } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { machineCautions, machineKind } from './cautions';

describe('machine cautions', () => {
  it('treats the welders as welding and every other category as rotating machinery', () => {
    expect(machineCategories.filter((c) => machineKind(c) === 'welding')).toEqual(['mig_welder', 'tig_welder']);
  });

  it('a welder asks for the helmet, gloves, ventilation and a fire watch', () => {
    const text = machineCautions('mig_welder').join(' ');
    for (const word of ['helmet', 'gloves', 'ventilation', 'Fire watch']) expect(text).toContain(word);
  });

  it('a lathe asks for eye protection, no gloves or jewellery, and the chuck key out', () => {
    const text = machineCautions('lathe').join(' ');
    for (const word of ['Eye protection', 'No gloves', 'jewellery', 'chuck key']) expect(text).toContain(word);
  });

  it('a band saw has no chuck, so no chuck key caution', () => {
    expect(machineCautions('band_saw').join(' ')).not.toContain('chuck key');
  });

  it('every category has cautions', () => {
    for (const category of machineCategories) expect(machineCautions(category).length).toBeGreaterThan(0);
  });
});
