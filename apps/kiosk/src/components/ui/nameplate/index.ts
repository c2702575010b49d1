export { Nameplate, type NameplateProps } from './nameplate';
export { nameplateStates, type NameplateState, type NameplateSize } from './nameplate-looks';
