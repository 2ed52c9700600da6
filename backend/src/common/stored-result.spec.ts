import { readableResult, unreadablePath } from './stored-result.js';

describe('reading a stored result', () => {
  const shape = ['errorPercent', 'moves[]', 'moves[].errorMm'];

  it('accepts a result whose listed fields are finite numbers', () => {
    const r = { errorPercent: -0.2, moves: [{ errorMm: 0.1 }, { errorMm: -0.2 }], extra: 'kept' };
    expect(unreadablePath(r, shape)).toBeNull();
    expect(readableResult(r, shape)).toBe(r);
  });

  it.each([
    [{ errorPercent: null, moves: [] }, 'errorPercent'],
    [{ errorPercent: 'NaN', moves: [] }, 'errorPercent'],
    [{ errorPercent: 1 }, 'moves[]'],
    [{ errorPercent: 1, moves: [{ errorMm: 1 }, { errorMm: null }] }, 'moves[].errorMm'],
    [{}, 'errorPercent'],
    [null, '(result)'],
    ['text', '(result)'],
  ])('names the first field that cannot be read: %j → %s', (stored, path) => {
    expect(unreadablePath(stored, shape)).toBe(path);
    expect(readableResult(stored, shape)).toBeNull();
  });
});
