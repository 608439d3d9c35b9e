import { PAN_OBSTACLE_KINDS, panCheck } from './pan-clearance';

/** Sump and pan against the front crossmember (obstacles of kind `crossmember`). */
export const SUMP_CROSSMEMBER_CHECK = panCheck({
  id: 'envelope.sump-crossmember',
  title: 'Oil pan to front crossmember',
  kinds: PAN_OBSTACLE_KINDS.crossmember,
  label: 'the front crossmember',
  fabrication: (settings) => ({
    operation: 'Notch and plate the front crossmember under the sump, or cut it out and relocate it',
    laborHours: settings.crossmemberFabricationHours,
    note: 'Structural welding on the frame: have it done by a qualified welder, keep the suspension pick-up points where they are, and check local rules for frame modifications.',
  }),
});
