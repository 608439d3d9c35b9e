import { DEMO_PROJECT_IDS } from './demo-projects';
import { DEMO_USER_IDS } from './demo-shop';

/** One reading on the demo sheet: millimetres (degrees for an angle), as the tape showed it. */
export interface DemoMeasurement {
  pointId: string;
  value: number;
  note: string | null;
  /** Minutes after the sheet was started. */
  minute: number;
}

export interface DemoMeasurementSheet {
  id: string;
  projectId: string;
  measuredById: string;
  startedAt: string;
  values: DemoMeasurement[];
}

/**
 * The demo truck's sheet, started but not finished: the fabricator got through the ride heights, the front
 * crossmember's bottom and faces, the rails, mount pads, radiator and transmission crossmember. The truck is
 * straight, so every reading so far agrees with the catalog's figure; the crossmember top and the pinion
 * height and angle are still to be read.
 */
export const DEMO_MEASUREMENT_SHEETS: DemoMeasurementSheet[] = [
  {
    id: '5a0b1c2d-0000-4000-8000-000000000501',
    projectId: DEMO_PROJECT_IDS.ridgeback,
    measuredById: DEMO_USER_IDS.fabricator,
    startedAt: '2026-11-30T08:10:00.000Z',
    values: [
      { pointId: 'ride-height.front-left', value: 340, note: 'Tyres at 35 psi, empty bed', minute: 0 },
      { pointId: 'ride-height.front-right', value: 340, note: null, minute: 2 },
      { pointId: 'ride-height.rear-left', value: 370, note: null, minute: 4 },
      { pointId: 'ride-height.rear-right', value: 370, note: null, minute: 6 },
      { pointId: 'front-crossmember.bottom', value: 252, note: null, minute: 11 },
      { pointId: 'front-crossmember.front-face', value: 90, note: null, minute: 14 },
      { pointId: 'front-crossmember.rear-face', value: 290, note: 'Plumb bob off the rear flange', minute: 16 },
      { pointId: 'center-link.bottom', value: 280, note: 'Wheels straight ahead', minute: 19 },
      { pointId: 'firewall.front-face', value: 760, note: null, minute: 23 },
      { pointId: 'rail.width@-300', value: 760, note: null, minute: 27 },
      { pointId: 'rail.width@0', value: 740, note: null, minute: 29 },
      { pointId: 'rail.width@300', value: 740, note: null, minute: 31 },
      { pointId: 'rail.width@600', value: 800, note: null, minute: 33 },
      { pointId: 'rail.width@900', value: 860, note: 'Clear of the brake line clips', minute: 35 },
      { pointId: 'mount-pad.left.height', value: 440, note: null, minute: 40 },
      { pointId: 'mount-pad.left.setback', value: 310, note: null, minute: 42 },
      { pointId: 'mount-pad.right.height', value: 440, note: null, minute: 44 },
      { pointId: 'mount-pad.right.setback', value: 310, note: null, minute: 46 },
      { pointId: 'mount-pad.spacing', value: 610, note: null, minute: 48 },
      { pointId: 'radiator.core-face', value: 190, note: null, minute: 53 },
      { pointId: 'transmission-crossmember.setback', value: 1400, note: null, minute: 58 },
      { pointId: 'transmission-crossmember.height', value: 338, note: null, minute: 60 },
    ],
  },
];
