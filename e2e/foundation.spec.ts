import { expect, test } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';
import { linkMailedTo } from './support/mail-drop';

const EVERYONE = ['Machines', 'Target sets', 'Calculators'];

test.describe('sign-in and the app frame', () => {
  for (const [role, email] of Object.entries(DEMO).filter(([r]) => r !== 'other')) {
    test(`${role} signs in and sees the navigation for the role`, async ({ page }) => {
      await signInAs(page, email);
      await expect(page.getByTestId('workshop-name')).toHaveText('Harbour Lane Fabrication');
      const nav = page.getByRole('navigation', { name: 'Main' });
      for (const label of EVERYONE) await expect(nav.getByRole('link', { name: label })).toBeVisible();
      if (role === 'admin') await expect(nav.getByRole('link', { name: 'People' })).toBeVisible();
      else await expect(nav.getByRole('link', { name: 'People' })).toHaveCount(0);
    });
  }

  test('a wrong password shows one clear message and no session', async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(DEMO.owner);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert')).toContainText('do not match');
    await page.goto('/machines');
    await expect(page).toHaveURL(/sign-in/);
  });

  test('the second workshop sees its own name only', async ({ page }) => {
    await signInAs(page, DEMO.other);
    await expect(page.getByTestId('workshop-name')).toHaveText('Kestrel Yard Makerspace');
  });

  test('client routes survive a reload, unknown pages say so, and sign-out works', async ({ page }) => {
    await signInAs(page, DEMO.admin);
    await page.goto('/people');
    await expect(page.getByRole('table', { name: 'Members' })).toBeVisible();
    await page.reload();
    await expect(page.getByRole('table', { name: 'Members' })).toContainText('viewer@example.com');
    await snap(page, 'frame-people-desktop');
    await page.goto('/no/such/page');
    await expect(page.getByText('Page not found')).toBeVisible();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page).toHaveURL(/sign-in/);
  });

  test('the frame works at tablet size with a navigation drawer', async ({ page }) => {
    await page.setViewportSize({ width: 820, height: 1180 });
    await signInAs(page, DEMO.technician);
    await page.getByRole('button', { name: 'Open navigation' }).click();
    await expect(
      page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calculators' }),
    ).toBeVisible();
    await snap(page, 'frame-tablet-drawer');
  });

  test('an admin adds a member, who sets a password from the e-mailed link and signs in', async ({ page, browser }) => {
    await signInAs(page, DEMO.admin);
    await page.goto('/people');
    await page.getByRole('button', { name: 'Add member' }).click();
    const stamp = Date.now();
    const email = `new.${stamp}@example.com`;
    // A name of its own, so a second run on the same database finds this member and no other.
    const name = `Nell Carver ${stamp % 100000}`;
    // The button waits for both a name and an address.
    await page.getByLabel('Name').fill(name);
    await expect(page.getByRole('dialog').getByRole('button', { name: 'Add member' })).toBeDisabled();
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('dialog').getByRole('button', { name: 'Add member' }).click();
    await expect(page.getByRole('dialog')).toContainText(`We have e-mailed ${email}`);
    await page.getByRole('button', { name: 'Done' }).click();
    const members = page.getByRole('table', { name: 'Members' });
    await expect(members).toContainText(name);
    await expect(members.getByRole('row').filter({ hasText: name })).toContainText('Invited, not signed in yet');
    // The local fake mail server caught the sign-in mail: the outbox shows the admin that it went,
    // never its link; the whole message is in the data folder's mail drop, as the person would get it.
    await page.goto('/outbox');
    await page
      .getByRole('button', { name: /Your Railwright sign-in for/ })
      .filter({ hasText: email })
      .click();
    await expect(page.getByText(/link hidden/).first()).toBeVisible();
    await expect(page.getByRole('link', { name: /set-password\?token=/ })).toHaveCount(0);
    const link = await linkMailedTo(email);
    const other = await browser.newPage();
    await other.goto(link);
    const resets: string[] = [];
    other.on('request', (r) => {
      if (r.method() === 'POST' && new URL(r.url()).pathname === '/api/auth/password-reset') resets.push(r.url());
    });
    const password = other.getByLabel('New password');
    const repeat = other.getByLabel('Repeat the password');
    const setIt = other.getByRole('button', { name: 'Set password and sign in' });
    // Too short: flagged as it is typed, the hint saying why; the repeat is not flagged while empty.
    await password.fill('too short');
    await expect(password).toHaveAttribute('aria-invalid', 'true');
    await expect(password).toHaveAccessibleDescription('At least 12 characters');
    await expect(repeat).toHaveAccessibleDescription('');
    await expect(setIt).toBeDisabled();
    await password.fill('nell chooses this one');
    await expect(password).toHaveAttribute('aria-invalid', 'false');
    await repeat.fill('nell chooses this');
    await expect(repeat).toHaveAccessibleDescription('The two entries differ');
    await expect(setIt).toBeDisabled();
    await repeat.press('Enter');
    await repeat.fill('nell chooses this one');
    await expect(repeat).toHaveAccessibleDescription('');
    // A change of the password checks the repeat again.
    await password.fill('nell chooses this one!');
    await expect(repeat).toHaveAccessibleDescription('The two entries differ');
    await password.fill('nell chooses this one');
    await expect(repeat).toHaveAccessibleDescription('');
    expect(resets).toEqual([]);
    await expect(setIt).toBeEnabled();
    await snap(other, 'set-password');
    await other.getByRole('button', { name: 'Set password and sign in' }).click();
    // Signed in straight away, on the machines list; the admin now sees her as active.
    await expect(other).toHaveURL(/\/machines$/);
    await expect(other.getByRole('heading', { name: 'Machines' })).toBeVisible();
    await other.close();
    await page.goto('/people');
    await expect(page.getByRole('table', { name: 'Members' }).getByRole('row').filter({ hasText: name })).toContainText(
      'Active',
    );
  });

  test('someone who forgot their password asks for a link from the sign-in page and is signed in after choosing a new one', async ({
    page,
  }) => {
    const admin = await page.context().browser()!.newPage();
    await signInAs(admin, DEMO.admin);
    await admin.goto('/people');
    await admin.getByRole('button', { name: 'Add member' }).click();
    const email = `forgot.${Date.now()}@example.com`;
    await admin.getByLabel('Name').fill('Fern Forgetful');
    await admin.getByLabel('E-mail').fill(email);
    await admin.getByRole('dialog').getByRole('button', { name: 'Add member' }).click();
    await expect(admin.getByRole('dialog')).toContainText(`We have e-mailed ${email}`);
    await admin.close();
    // She never used the invitation and lost it: she asks for a link herself.
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    // The page loads on demand: until its heading shows, the sign-in form's own E-mail field is still there.
    await expect(page.getByRole('heading', { name: 'Forgot your password?' })).toBeVisible();
    await expect(page.getByLabel('E-mail')).toHaveValue(email);
    const asked: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'POST' && new URL(r.url()).pathname === '/api/auth/password-reset/request')
        asked.push(r.url());
    });
    // Not an address: refused under the field once it is left, and nothing is sent.
    await page.getByLabel('E-mail').fill(email.replace('@', ' at '));
    await expect(page.getByLabel('E-mail')).toHaveAccessibleDescription('');
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await expect(page.getByLabel('E-mail')).toHaveAccessibleDescription(
      'Enter an e-mail address, such as name@example.com',
    );
    expect(asked).toEqual([]);
    await page.getByLabel('E-mail').fill(email);
    await expect(page.getByLabel('E-mail')).toHaveAccessibleDescription('');
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await expect(page.getByRole('status')).toContainText('If an active account uses this address');
    await snap(page, 'forgot-password-sent');
    const link = await linkMailedTo(email, /Choose a new Railwright password/);
    await page.goto(link);
    await page.getByLabel('New password').fill('fern remembers this one');
    await page.getByLabel('Repeat the password').fill('fern remembers this one');
    await page.getByRole('button', { name: 'Set password and sign in' }).click();
    await expect(page).toHaveURL(/\/machines$/);
  });
});
