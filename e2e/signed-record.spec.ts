import { expect, test, type Browser, type Page } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createPublicKey, verify } from 'node:crypto';
import { DEMO, DEMO_PASSWORD, signInAs, snap } from './support/session';

const WIDTHS = [1366, 820, 390];

async function as(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
  await signInAs(page, email);
  return page;
}

async function snapAtWidths(page: Page, name: string) {
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: width < 600 ? 844 : 900 });
    await snap(page, `${name}-${width}`);
  }
  await page.setViewportSize({ width: 1366, height: 900 });
}

test.describe('the signed record', () => {
  test('approve, check the certificate signed out, reopen with a reason, see the change named', async ({ browser }) => {
    // Three people's pages, a signature and a certificate: longer than one page's test on a busy machine.
    test.slow();
    const tech = await as(browser, DEMO.technician);
    const owner = await as(browser, DEMO.owner);
    const created = await tech.request.post('/api/machines', {
      data: { name: 'Sealed bench router', kind: 'router', workArea: { x: 600, y: 400 } },
    });
    expect(created.status()).toBe(201);
    const machineId = (await created.json()).id as string;
    const walk = await (await tech.request.get(`/api/machines/${machineId}/safety-walk`)).json();
    for (const section of walk.sections as { items: { id: string }[] }[]) {
      for (const item of section.items)
        expect(
          (
            await tech.request.put(`/api/machines/${machineId}/safety-walk/items/${item.id}`, {
              data: { answer: 'yes' },
            })
          ).status(),
        ).toBe(200);
    }
    const blocking = (await (await owner.request.get(`/api/machines/${machineId}/readiness`)).json()).blocking as {
      key: string;
    }[];
    for (const c of blocking) {
      const res = await owner.request.post(`/api/machines/${machineId}/checks/${encodeURIComponent(c.key)}/waiver`, {
        data: { reason: 'Bench router: checked by hand at assembly.' },
      });
      expect(res.status()).toBe(201);
    }
    expect((await tech.request.post(`/api/machines/${machineId}/approval-requests`, { data: {} })).status()).toBe(201);

    // The owner signs on the board.
    await owner.goto(`/machines/${machineId}?tab=readiness`);
    await owner.getByRole('button', { name: 'Approve…' }).click();
    const sign = owner.getByRole('dialog', { name: /Approve Sealed bench router/ });
    await sign.getByLabel('Your password (to sign)').fill(DEMO_PASSWORD);
    await sign.getByRole('button', { name: 'Sign and approve' }).click();
    await expect(sign).toBeHidden();
    await expect(owner.getByLabel('Approval')).toContainText('Approved as ready to cut');

    // The address printed on the certificate, read back from the PDF.
    const pdf = await owner.request.get(`/api/machines/${machineId}/certificate.pdf`);
    const text = execFileSync('pdftotext', ['-layout', '-', '-'], { input: await pdf.body() }).toString('utf8');
    const address = /(https?:\/\/\S+\/verify\/[A-Za-z0-9_-]+)/.exec(text)?.[1];
    expect(address).toBeDefined();
    const verifyPath = new URL(address!).pathname;

    // Anyone holding it, signed out.
    const stranger = await (await browser.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
    await stranger.goto(address!);
    const verdict = stranger.getByRole('status', { name: 'Verification result' });
    await expect(verdict).toContainText('Signature valid · record unchanged');
    await expect(stranger.getByRole('heading', { name: /Sealed bench router/ })).toBeVisible();
    await expect(stranger.getByText('Owen Pryce')).toBeVisible();
    await expect(stranger.getByRole('button', { name: 'Sign out' })).toHaveCount(0);
    await snapAtWidths(stranger, 'verify-valid');

    // The downloads: the record's signature checks with node:crypto and the published key alone.
    const [recordDownload] = await Promise.all([
      stranger.waitForEvent('download'),
      stranger.getByRole('link', { name: 'Signed record (JSON)' }).click(),
    ]);
    const record = JSON.parse(readFileSync(await recordDownload.path(), 'utf8'));
    const pem = await (await stranger.request.get('/api/public/signing-key')).text();
    expect(
      verify(null, Buffer.from(record.content, 'utf8'), createPublicKey(pem), Buffer.from(record.signature, 'base64')),
    ).toBe(true);
    await expect(stranger.getByRole('link', { name: 'Public key (PEM)' })).toHaveAttribute(
      'href',
      '/api/public/signing-key',
    );

    // The owner reopens with a reason: short reasons are refused before sending.
    await owner.getByRole('button', { name: 'Reopen for changes…' }).click();
    const dialog = owner.getByRole('dialog', { name: 'Reopen Sealed bench router for changes' });
    const confirm = dialog.getByRole('button', { name: 'Reopen for changes' });
    await expect(confirm).toBeDisabled();
    await dialog.getByLabel('Reason for reopening').fill('Y2');
    await dialog.getByLabel('Reason for reopening').blur();
    await expect(dialog).toContainText('at least 10 characters (2 so far)');
    await expect(confirm).toBeDisabled();
    await snapAtWidths(owner, 'reopen-dialog-short');
    await dialog.getByLabel('Reason for reopening').fill('Y2 rail knocked by a pallet; re-bed and sweep it again.');
    await expect(confirm).toBeEnabled();
    await snapAtWidths(owner, 'reopen-dialog');
    await confirm.click();
    await expect(dialog).toBeHidden();
    await expect(owner.getByText('Reopened for changes').first()).toBeVisible();
    await expect(owner.getByRole('alert').filter({ hasText: 'Y2 rail knocked by a pallet' })).toBeVisible();
    await expect(owner.getByRole('button', { name: 'Reopen for changes…' })).toHaveCount(0);
    await snap(owner, 'readiness-reopened');
    await owner.goto('/machines');
    await expect(owner.getByText('Reopened for changes').first()).toBeVisible();

    // The certificate still checks, and says the approval no longer stands.
    await stranger.goto(verifyPath);
    await expect(verdict).toContainText('Signature valid');
    await expect(verdict).toContainText('This approval no longer stands');
    await expect(verdict).toContainText('Y2 rail knocked by a pallet');
    await snapAtWidths(stranger, 'verify-reopened');

    // Once reopened the machine can be changed; the certificate then names the change.
    const changed = await owner.request.patch(`/api/machines/${machineId}`, { data: { notes: 'Y2 rail re-bedded.' } });
    expect(changed.status()).toBe(200);
    await stranger.reload();
    await expect(verdict).toContainText('Not valid · the record has changed since it was signed');
    const diff = stranger.getByRole('table', { name: 'Differences from the signed record' });
    await expect(diff).toContainText('Machine specification');
    await expect(diff).toContainText('notes');
    await expect(diff).toContainText('Y2 rail re-bedded.');
    await snapAtWidths(stranger, 'verify-changed');

    await stranger.goto('/verify/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA');
    await expect(stranger.getByRole('alert')).toContainText('No approval has this verification address');
    await snap(stranger, 'verify-unknown');
  });
});
