// eslint-disable-next-line @typescript-eslint/no-var-requires
const jsts = require('jsts/dist/jsts.min.js');
import { Polygon } from '@flatten-js/core';
it('works', () => {
  const r = new jsts.io.WKTReader();
  const a = r.read('POLYGON((0 0,10 0,10 10,0 10,0 0))');
  const b = r.read('POLYGON((20 0,30 0,30 10,20 10,20 0))');
  expect(jsts.operation.distance.DistanceOp.distance(a, b)).toBe(10);
  const p = new Polygon([[0,0],[10,0],[10,10],[0,10]]);
  expect(p.area()).toBe(100);
});
