import { panCheck } from './pan-clearance';
import { PAN_RULES } from './pan-rules';

/** Sump and pan against the steering linkage (obstacles of kind `steering-linkage`). */
export const SUMP_STEERING_CHECK = panCheck({
  ...PAN_RULES.steering,
  title: 'Oil pan to steering linkage',
  fabrication: (settings) => ({
    operation: 'Re-route or relocate the steering linkage (drop the centre link or change the pitman arm)',
    laborHours: settings.steeringLinkageFabricationHours,
    note: 'Steering changes are safety-critical: use parts made for the purpose, check full lock both ways, have the alignment set afterwards and follow local inspection rules.',
  }),
});
