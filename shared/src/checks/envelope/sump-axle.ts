import { panCheck } from './pan-clearance';
import { PAN_RULES } from './pan-rules';

/** Sump and pan against the front axle or differential at full bump. */
export const SUMP_AXLE_CHECK = panCheck({
  ...PAN_RULES.axle,
  title: 'Oil pan to front axle or differential at full bump',
  fabrication: (settings) => ({
    operation: 'Fit taller bump stops to limit axle up-travel',
    laborHours: settings.axleBumpStopFabricationHours,
    note: 'Less up-travel changes ride and handling; support the vehicle on stands, never on a jack alone, while working under it.',
  }),
});
