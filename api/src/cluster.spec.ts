import { apiWorkerCount } from './cluster';

describe('API_WORKERS', () => {
  it('is one process when unset, one per core for auto, else the number given', () => {
    expect(apiWorkerCount(undefined, 8)).toBe(1);
    expect(apiWorkerCount('', 8)).toBe(1);
    expect(apiWorkerCount('auto', 2)).toBe(2);
    expect(apiWorkerCount('auto', 0)).toBe(1);
    expect(apiWorkerCount('3', 2)).toBe(3);
  });

});
