import { SessionCache } from './session-cache.js';
import type { LoadedSessionUser } from './session-store.js';

const person = (id: string, workshopId = 'w1'): LoadedSessionUser => ({
  id,
  email: `${id}@example.com`,
  name: id,
  role: 'viewer',
  workshopId,
  workshopName: 'Shop',
  sessionsValidFrom: 0,
});

describe('SessionCache', () => {
  let now = 1_000_000;
  const cache = () => {
    const c = new SessionCache(5_000, 3, () => now);
    c.setListening(true);
    return c;
  };

  it('hands back a fresh copy of what was kept, until its lifetime or the session expiry, whichever is first', () => {
    const c = cache();
    c.put('a', { userId: 'p1', createdAt: 1 }, person('p1'), now + 60_000);
    c.put('b', { userId: 'p2' }, person('p2'), now + 2_000);
    const first = c.get('a')!;
    first.sess.userId = 'changed';
    expect(c.get('a')!.sess).toEqual({ userId: 'p1', createdAt: 1 });
    now += 2_000;
    expect(c.get('b')).toBeUndefined();
    expect(c.get('a')).toBeDefined();
    now += 3_000;
    expect(c.get('a')).toBeUndefined();
  });

  it('keeps nothing and serves nothing while the announcements are not heard', () => {
    const c = cache();
    c.put('a', { userId: 'p1' }, person('p1'), now + 60_000);
    c.setListening(false);
    expect(c.get('a')).toBeUndefined();
    c.put('b', { userId: 'p1' }, person('p1'), now + 60_000);
    c.setListening(true);
    expect(c.get('b')).toBeUndefined();
    expect(c.size).toBe(0);
  });

  it('forgets by session, by person (with sessions naming nobody) and by workshop, as announced', () => {
    const c = cache();
    c.put('a', {}, person('p1', 'w1'), now + 60_000);
    c.put('b', {}, person('p2', 'w2'), now + 60_000);
    c.put('c', {}, false, now + 60_000);
    c.announced('person:p1');
    expect([c.get('a'), c.get('b'), c.get('c')].map(Boolean)).toEqual([false, true, false]);
    c.put('a', {}, person('p1', 'w1'), now + 60_000);
    c.announced('workshop:w2');
    expect([c.get('a'), c.get('b')].map(Boolean)).toEqual([true, false]);
    c.announced('session:a');
    expect(c.get('a')).toBeUndefined();
  });

  it('forgets everything on an announcement it does not know, but not on a mark', () => {
    const c = cache();
    c.put('a', {}, person('p1'), now + 60_000);
    c.announced('mark:123');
    expect(c.get('a')).toBeDefined();
    c.announced('something-new:1');
    expect(c.size).toBe(0);
  });

  it('drops the oldest entry when full', () => {
    const c = cache();
    for (const sid of ['a', 'b', 'c', 'd']) c.put(sid, {}, person(sid), now + 60_000);
    expect(c.size).toBe(3);
    expect(c.get('a')).toBeUndefined();
    expect(c.get('d')).toBeDefined();
  });
});
