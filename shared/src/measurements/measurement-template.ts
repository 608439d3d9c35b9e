import { interpolateStations } from '../geometry/interpolate';
import type { ChassisObstacle, ChassisPoint, ChassisSpec } from '../types/fit-spec';
import type { MeasurementPoint, MeasurementPointKind, RideHeightCorner } from './measurement-points';

const round1 = (value: number): number => Math.round(value * 10) / 10;

/** Mean x of the outline's vertices at its highest (`top`) or lowest (`bottom`) z: where the tape goes. */
function edgeStation(outline: readonly ChassisPoint[], edge: 'top' | 'bottom'): { x: number; z: number } {
  const zs = outline.map((p) => p.z);
  const z = edge === 'top' ? Math.max(...zs) : Math.min(...zs);
  const onEdge = outline.filter((p) => p.z === z);
  return { x: round1(onEdge.reduce((sum, p) => sum + p.x, 0) / onEdge.length), z };
}

/** The frame rails' underside at a fore-aft station (interpolated between stations, end stations held beyond). */
export function railUndersideAt(chassis: Pick<ChassisSpec, 'railStations'>, x: number): number | null {
  if (chassis.railStations.length === 0) return null;
  const stations = [...chassis.railStations].sort((a, b) => a.x - b.x);
  return round1(interpolateStations(stations, (s) => s.x, (s) => s.zBottom, x));
}

function mmText(value: number): string {
  return `${Math.round(value)} mm`;
}

function obstaclePoints(obstacle: ChassisObstacle): MeasurementPoint[] {
  const xs = obstacle.outline.map((p) => p.x);
  const front = Math.min(...xs);
  const rear = Math.max(...xs);
  const top = edgeStation(obstacle.outline, 'top');
  const bottom = edgeStation(obstacle.outline, 'bottom');
  const name = obstacle.name;
  const point = (kind: MeasurementPointKind, suffix: string, label: string, howTo: string, catalogValue: number, atX?: number, required = true): MeasurementPoint => ({
    id: `${obstacle.id}.${suffix}`,
    kind,
    target: obstacle.id,
    label,
    howTo,
    catalogValue,
    required,
    ...(atX !== undefined && { atX }),
  });
  if (obstacle.kind === 'crossmember') {
    return [
      point('obstacle-top', 'top', `${name}: top`, `Floor to the highest point of the ${name.toLowerCase()} under the oil pan, about ${mmText(top.x)} behind the front axle line. Hold the tape plumb; a straightedge across the top helps.`, top.z, top.x),
      point('obstacle-bottom', 'bottom', `${name}: bottom`, `Floor to the lowest edge of the ${name.toLowerCase()}, about ${mmText(bottom.x)} behind the front axle line.`, bottom.z, bottom.x),
      point('obstacle-front-face', 'front-face', `${name}: front face`, `Along the floor from the plumb line under the front hub centre back to a plumb line dropped from the front face of the ${name.toLowerCase()}.`, front),
      point('obstacle-rear-face', 'rear-face', `${name}: rear face`, `Along the floor from the plumb line under the front hub centre back to a plumb line dropped from the rear face of the ${name.toLowerCase()}.`, rear),
    ];
  }
  if (obstacle.kind === 'steering-linkage') {
    return [
      point('obstacle-bottom', 'bottom', `${name}: bottom`, `Floor to the underside of the ${name.toLowerCase()} with the wheels straight ahead.`, bottom.z, bottom.x),
      point('obstacle-rear-face', 'rear-face', `${name}: rear face`, `Plumb line under the front hub centre back to the rearmost edge of the ${name.toLowerCase()}, wheels straight ahead.`, rear, undefined, false),
    ];
  }
  if (obstacle.kind === 'firewall') {
    return [
      point('obstacle-front-face', 'front-face', 'Firewall face', 'Plumb line under the front hub centre back to the firewall face at engine height (ignore the tunnel opening).', front),
    ];
  }
  return [];
}

const CORNER_WORDS: Record<RideHeightCorner, string> = {
  'front-left': 'front left',
  'front-right': 'front right',
  'rear-left': 'rear left',
  'rear-right': 'rear right',
};

/**
 * The measurement points a chassis model needs, generated from its catalog spec: the catalog reading of each
 * point is what the tape should show on a truck built to the catalog figures.
 */
export function generateMeasurementTemplate(chassis: ChassisSpec): MeasurementPoint[] {
  const points: MeasurementPoint[] = [];
  for (const corner of ['front-left', 'front-right', 'rear-left', 'rear-right'] as const) {
    const atX = corner.startsWith('front') ? 0 : chassis.wheelbaseMm;
    points.push({
      id: `ride-height.${corner}`,
      kind: 'ride-height',
      target: corner,
      atX,
      label: `Ride height, ${CORNER_WORDS[corner]}`,
      howTo: `Truck on its wheels on a level floor, tyres at running pressure, no load: floor to the underside of the ${corner.endsWith('left') ? 'left' : 'right'} frame rail straight above the ${corner.startsWith('front') ? 'front' : 'rear'} axle centre.`,
      catalogValue: railUndersideAt(chassis, atX),
      required: true,
    });
  }
  for (const obstacle of chassis.obstacles) points.push(...obstaclePoints(obstacle));
  for (const station of [...chassis.railStations].sort((a, b) => a.x - b.x)) {
    const where = station.x < 0 ? `${mmText(-station.x)} ahead of` : station.x === 0 ? 'at' : `${mmText(station.x)} behind`;
    points.push({
      id: `rail.width@${station.x}`,
      kind: 'rail-inside-width',
      atX: station.x,
      label: `Frame rails: inside width ${where} the front axle line`,
      howTo: `Square across the frame, inside face of the left rail to inside face of the right rail, ${where} the front axle line. Measure at mid-height of the rail, clear of brackets and rivet heads.`,
      catalogValue: station.insideWidthMm,
      required: true,
    });
    points.push({
      id: `rail.bottom@${station.x}`,
      kind: 'rail-bottom',
      atX: station.x,
      label: `Frame rails: underside ${where} the front axle line`,
      howTo: `Floor to the underside of the frame rail ${where} the front axle line (left and right the same; note it if not).`,
      catalogValue: station.zBottom,
      required: false,
    });
  }
  for (const side of ['left', 'right'] as const) {
    const pad = chassis.mountPads[side];
    points.push({
      id: `mount-pad.${side}.height`,
      kind: 'mount-pad-height',
      target: side,
      label: `Engine mount pad, ${side}: height`,
      howTo: `Floor to the top face of the ${side} frame mount pad (where the engine mount bolts on), at the bolt hole centre.`,
      catalogValue: pad.z,
      required: true,
    });
    points.push({
      id: `mount-pad.${side}.setback`,
      kind: 'mount-pad-setback',
      target: side,
      label: `Engine mount pad, ${side}: behind the front axle`,
      howTo: `Plumb line under the front hub centre back to a plumb line dropped from the ${side} mount pad's bolt hole centre.`,
      catalogValue: pad.x,
      required: true,
    });
  }
  points.push({
    id: 'mount-pad.spacing',
    kind: 'mount-pad-spacing',
    label: 'Engine mount pads: centre to centre',
    howTo: 'Square across the frame, bolt hole centre of the left mount pad to bolt hole centre of the right one.',
    catalogValue: round1(chassis.mountPads.right.y - chassis.mountPads.left.y),
    required: true,
  });
  points.push(
    {
      id: 'radiator.core-face',
      kind: 'radiator-core-face',
      label: 'Radiator core: rear face, ahead of the front axle',
      howTo: 'Plumb line under the front hub centre forward to a plumb line dropped from the rear face of the radiator core (the fins, not the tank).',
      catalogValue: round1(-chassis.radiatorCore.x),
      required: true,
    },
    {
      id: 'radiator.core-top',
      kind: 'radiator-core-top',
      label: 'Radiator core: top',
      howTo: 'Floor to the top edge of the radiator core fins.',
      catalogValue: chassis.radiatorCore.zTo,
      required: false,
    },
    {
      id: 'radiator.core-bottom',
      kind: 'radiator-core-bottom',
      label: 'Radiator core: bottom',
      howTo: 'Floor to the bottom edge of the radiator core fins.',
      catalogValue: chassis.radiatorCore.zFrom,
      required: false,
    },
  );
  for (const hood of chassis.hoodLine) {
    const where = hood.x < 0 ? `${mmText(-hood.x)} ahead of` : hood.x === 0 ? 'at' : `${mmText(hood.x)} behind`;
    points.push({
      id: `hood@${hood.x}`,
      kind: 'hood-line',
      atX: hood.x,
      label: `Hood underside ${where} the front axle line`,
      howTo: `Hood closed: floor to the underside of the hood (the inner panel or brace, whichever is lower) ${where} the front axle line, on the centreline.`,
      catalogValue: hood.z,
      required: false,
    });
  }
  points.push(
    {
      id: 'transmission-crossmember.setback',
      kind: 'transmission-crossmember-setback',
      label: 'Transmission crossmember: mount pad behind the front axle',
      howTo: 'Plumb line under the front hub centre back to the centre of the transmission mount pad on the crossmember.',
      catalogValue: chassis.transmissionCrossmember.x,
      required: true,
    },
    {
      id: 'transmission-crossmember.height',
      kind: 'transmission-crossmember-height',
      label: 'Transmission crossmember: mount pad height',
      howTo: 'Floor to the top face of the transmission mount pad on the crossmember.',
      catalogValue: chassis.transmissionCrossmember.z,
      required: true,
    },
    {
      id: 'pinion.height',
      kind: 'pinion-height',
      label: 'Pinion: centre height',
      howTo: 'Floor to the centre of the rear axle pinion yoke (the U-joint centre).',
      catalogValue: chassis.pinion.z,
      required: true,
    },
    {
      id: 'pinion.angle',
      kind: 'pinion-angle',
      label: 'Pinion: angle',
      howTo: 'Angle finder on the pinion yoke ears (or the flat machined face), read against level: positive when the pinion nose points up.',
      catalogValue: chassis.pinion.angleDeg,
      required: true,
    },
  );
  return points;
}
