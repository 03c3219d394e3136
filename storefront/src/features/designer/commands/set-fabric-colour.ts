import type { EditCommand } from './command.ts';

export interface FabricColourArgs {
  colourId: number;
}

export const setFabricColour: EditCommand<FabricColourArgs, 'set-fabric-colour'> = {
  id: 'set-fabric-colour',
  label: 'Change the fabric colour',
  isRecorded: true,
  perform(state, { colourId }, setting) {
    if (colourId === state.colourId || !setting.garment.colours.some((colour) => colour.id === colourId)) return state;
    return { ...state, colourId };
  },
};
