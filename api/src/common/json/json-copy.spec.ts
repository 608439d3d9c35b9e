import { jsonCopy } from './json-copy';

class Body {
  name = 'pan';
  depthMm: number | undefined = undefined;
  outline = [{ x: 1, y: 2 }];
}

describe('jsonCopy', () => {
  it('turns class instances into plain objects and drops undefined fields', () => {
    const copy = jsonCopy(new Body());
    expect(Object.getPrototypeOf(copy)).toBe(Object.prototype);
    expect(copy).toStrictEqual({ name: 'pan', outline: [{ x: 1, y: 2 }] });
  });

  it('copies deeply: changing the copy leaves the original alone', () => {
    const original = { outline: [{ x: 1, y: 2 }] };
    const copy = jsonCopy(original);
    copy.outline[0].x = 9;
    expect(original.outline[0].x).toBe(1);
  });

  it('writes dates as ISO strings, as they travel in JSON', () => {
    expect(jsonCopy({ at: new Date('2026-01-02T03:04:05.000Z') })).toStrictEqual({ at: '2026-01-02T03:04:05.000Z' });
  });
});
