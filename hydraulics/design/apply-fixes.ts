import type { LineFix } from '../checks/types';
import { HydraulicsInputError } from '../errors';
import type { LineDevice, LineInput } from '../profile/types';

/**
 * Applies one-click fixes to a line input and returns a NEW input (the given one is not touched):
 * devices are added in chainage order, pipe changes replace the stretch's pipe by id.
 */
export function applyLineFixes(input: LineInput, fixes: readonly LineFix[]): LineInput {
  const devices: LineDevice[] = [...(input.devices ?? [])];
  const stretches = input.stretches.map((stretch) => ({ ...stretch }));
  fixes.forEach((fix, i) => {
    if (fix.kind === 'add-device') {
      const device: LineDevice = { kind: fix.device, chainageM: fix.chainageM };
      if (fix.waterLevelM !== undefined) device.waterLevelM = fix.waterLevelM;
      devices.push(device);
      return;
    }
    if (!Number.isInteger(fix.stretchIndex) || fix.stretchIndex < 0 || fix.stretchIndex >= stretches.length) {
      throw new HydraulicsInputError('fixes.stretchIndex', `no stretch ${fix.stretchIndex} on this line`, i);
    }
    stretches[fix.stretchIndex].pipe = fix.pipeId;
  });
  devices.sort((a, b) => a.chainageM - b.chainageM);
  return { ...input, devices, stretches };
}
