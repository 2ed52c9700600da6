import { finiteList, readableComputation, readableResult, unreadablePath } from './stored-result.js';

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

describe('reading stored lists and results computed again on read', () => {
  it('a list of readings is readable only when every element is a finite number', () => {
    expect(finiteList([0, -0.01, 2.5])).toBe(true);
    expect(finiteList([])).toBe(true);
    // JSON keeps NaN as null; a hand edit may leave text.
    expect(finiteList([0, null, 1])).toBe(false);
    expect(finiteList([0, 'NaN', 1])).toBe(false);
    expect(finiteList([0, Infinity])).toBe(false);
    expect(finiteList(null)).toBe(false);
  });

  it('a computation that throws or yields a non-finite number reads as unreadable', () => {
    expect(readableComputation(() => ({ mmPerMetre: 0.5 }), ['mmPerMetre'])).toEqual({ mmPerMetre: 0.5 });
    expect(readableComputation(() => ({ mmPerMetre: NaN }), ['mmPerMetre'])).toBeNull();
    expect(
      readableComputation(() => {
        throw new Error('side must be positive');
      }, ['mmPerMetre']),
    ).toBeNull();
  });
});
