import { panCheck } from './pan-clearance';
import { PAN_RULES } from './pan-rules';

/** Sump and pan against the front crossmember (obstacles of kind `crossmember`). */
export const SUMP_CROSSMEMBER_CHECK = panCheck({
  ...PAN_RULES.crossmember,
  title: 'Oil pan to front crossmember',
  fabrication: (settings) => ({
    operation: 'Notch and plate the front crossmember under the sump, or cut it out and relocate it',
    laborHours: settings.crossmemberFabricationHours,
    operationCode: 'crossmember-modify',
    note: 'Structural welding on the frame: have it done by a qualified welder, keep the suspension pick-up points where they are, and check local rules for frame modifications.',
  }),
});
