import { LoginThrottle } from './login-throttle.js';

describe('LoginThrottle', () => {
  it('refuses the sixth attempt after five failures and lets it through after the window', () => {
    let now = 1_000_000;
    const throttle = new LoginThrottle(() => now);
    for (let i = 0; i < 5; i++) {
      expect(() => throttle.assertAllowed('1.2.3.4', 'a@example.com')).not.toThrow();
      throttle.recordFailure('1.2.3.4', 'A@example.com');
    }
    expect(() => throttle.assertAllowed('1.2.3.4', 'a@example.com')).toThrow(/Too many failed sign-ins/);
    // another account from the same address is still allowed
    expect(() => throttle.assertAllowed('1.2.3.4', 'b@example.com')).not.toThrow();
    now += 15 * 60 * 1000;
    expect(() => throttle.assertAllowed('1.2.3.4', 'a@example.com')).not.toThrow();
  });

  it('clears the account counter on success', () => {
    const throttle = new LoginThrottle(() => 0);
    for (let i = 0; i < 4; i++) throttle.recordFailure('x', 'c@example.com');
    throttle.recordSuccess('x', 'c@example.com');
    throttle.recordFailure('x', 'c@example.com');
    expect(() => throttle.assertAllowed('x', 'c@example.com')).not.toThrow();
  });
});
