import { hashPassword, verifyPassword } from './password.js';

describe('password hashing', () => {
  it('verifies the right password and refuses a wrong one', async () => {
    const stored = await hashPassword('railwright-demo');
    expect(stored.startsWith('scrypt$')).toBe(true);
    expect(stored).not.toContain('railwright-demo');
    await expect(verifyPassword('railwright-demo', stored)).resolves.toBe(true);
    await expect(verifyPassword('railwright-dem0', stored)).resolves.toBe(false);
  });

  it('salts every hash', async () => {
    expect(await hashPassword('same')).not.toEqual(await hashPassword('same'));
  });
});
