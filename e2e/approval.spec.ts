import { expect, test, type Browser, type Page } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, renameSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { DEMO, DEMO_PASSWORD, signInAs, snap } from './support/session';

const SHOTS = path.join(__dirname, 'screenshots');

async function as(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
  await signInAs(page, email);
  return page;
}

/** The board's blocking checks, read through the API with the page's own session. */
async function blocking(page: Page, machineId: string): Promise<{ key: string; subject: string }[]> {
  const res = await page.request.get(`/api/machines/${machineId}/readiness`);
  return (await res.json()).blocking;
}

test.describe('readiness board to signed certificate', () => {
  test('request refused, waivers, request, signature with password, certificate download', async ({ browser }) => {
    // Three people's pages, a signature and a certificate: longer than one page's test on a busy machine.
    test.slow();
    const tech = await as(browser, DEMO.technician);
    const created = await tech.request.post('/api/machines', {
      data: { name: 'Spindle test router', kind: 'router', workArea: { x: 600, y: 400 } },
    });
    expect(created.status()).toBe(201);
    const machineId = (await created.json()).id as string;

    await tech.goto(`/machines/${machineId}`);
    await expect(tech.getByRole('tab', { name: 'Readiness', selected: true })).toBeVisible();
    await expect(tech.getByRole('table', { name: 'Required checks' })).toBeVisible();
    await tech.getByRole('button', { name: 'Request approval' }).click();
    const refusal = tech.getByRole('alert').filter({ hasText: 'Approval cannot be requested yet' });
    await expect(refusal).toBeVisible();
    await expect(refusal).toContainText('not started');
    await snap(tech, 'readiness-refused');

    // The safety walk is answered (it can never be waived); the owner waives every other check
    // but one through the API, and the last one in the dialog.
    const owner = await as(browser, DEMO.owner);
    const walk = await (await tech.request.get(`/api/machines/${machineId}/safety-walk`)).json();
    for (const section of walk.sections as { items: { id: string }[] }[]) {
      for (const item of section.items) {
        const res = await tech.request.put(`/api/machines/${machineId}/safety-walk/items/${item.id}`, {
          data: { answer: 'yes' },
        });
        expect(res.status()).toBe(200);
      }
    }
    const open = await blocking(owner, machineId);
    expect(open.length).toBeGreaterThan(0);
    for (const c of open.slice(1)) {
      const res = await owner.request.post(`/api/machines/${machineId}/checks/${encodeURIComponent(c.key)}/waiver`, {
        data: { reason: 'Bench-top test machine: checked by hand at assembly.' },
      });
      expect(res.status()).toBe(201);
    }
    await owner.goto(`/machines/${machineId}?tab=readiness`);
    await owner
      .getByRole('button', { name: /^Waive / })
      .first()
      .click();
    const waiver = owner.getByRole('dialog', { name: 'Waive a check' });
    await expect(waiver.getByRole('button', { name: 'Waive with this reason' })).toBeDisabled();
    // A reason too short keeps the waiver off, the hint saying how long it must be.
    await waiver.getByLabel('Reason').fill('Not yet');
    await expect(waiver.getByLabel('Reason')).toHaveAccessibleDescription('Say why, in at least 10 characters');
    await expect(waiver.getByRole('button', { name: 'Waive with this reason' })).toBeDisabled();
    await waiver.getByLabel('Reason').fill('Not fitted yet on this bench machine; checked before the first cut.');
    await expect(waiver.getByLabel('Reason')).toHaveAccessibleDescription('67 characters');
    await snap(owner, 'readiness-waiver-dialog');
    await waiver.getByRole('button', { name: 'Waive with this reason' }).click();
    await expect(waiver).toBeHidden();
    await expect(
      owner.getByText('“Not fitted yet on this bench machine; checked before the first cut.”'),
    ).toBeVisible();
    expect(await blocking(owner, machineId)).toEqual([]);

    await tech.reload();
    await tech.getByRole('button', { name: 'Request approval' }).click();
    await expect(tech.getByText(/requested approval on/)).toBeVisible();
    await expect(tech.getByRole('button', { name: 'Request approval' })).toBeHidden();
    await expect(tech.getByRole('button', { name: 'Approve…' })).toBeHidden();

    await owner.reload();
    await owner.getByRole('button', { name: 'Approve…' }).click();
    const sign = owner.getByRole('dialog', { name: /Approve Spindle test router/ });
    await expect(sign.getByLabel('Statement you sign')).toHaveValue(/ready to cut/);
    await expect(sign).toContainText('Moving gantry');
    await expect(sign).toContainText('licensed electrician');
    // A statement too short to sign is named under it as it is edited; neither the button nor Enter signs it.
    const signed: string[] = [];
    owner.on('request', (r) => {
      if (r.method() === 'POST' && new URL(r.url()).pathname === `/api/machines/${machineId}/approvals`)
        signed.push(r.url());
    });
    const statement = sign.getByLabel('Statement you sign');
    const offered = await statement.inputValue();
    await statement.fill('Ready to cut.');
    await expect(statement).toHaveAccessibleDescription('The statement must be at least 20 characters');
    await expect(statement).toHaveAttribute('aria-invalid', 'true');
    await sign.getByLabel('Your password (to sign)').fill('not the password');
    await expect(sign.getByRole('button', { name: 'Sign and approve' })).toBeDisabled();
    await sign.getByLabel('Your password (to sign)').press('Enter');
    await statement.fill(offered);
    await expect(statement).toHaveAccessibleDescription('Printed on the certificate as written here.');
    expect(signed).toEqual([]);
    await sign.getByLabel('Your password (to sign)').fill('not the password');
    await sign.getByRole('button', { name: 'Sign and approve' }).click();
    await expect(sign.getByRole('alert').filter({ hasText: 'password is not right' })).toBeVisible();
    await snap(owner, 'approve-dialog');
    await sign.getByLabel('Your password (to sign)').fill(DEMO_PASSWORD);
    await sign.getByRole('button', { name: 'Sign and approve' }).click();
    await expect(sign).toBeHidden();
    expect(signed).toHaveLength(2);
    const summary = owner.getByLabel('Approval');
    await expect(summary).toContainText('Approved as ready to cut by Owen Pryce');
    const hash = (await owner.getByTestId('record-hash').textContent())!.trim();
    expect(hash).toMatch(/^[0-9a-f]{64}$/);
    await expect(owner.getByText('Ready to cut').first()).toBeVisible();
    await snap(owner, 'readiness-approved');

    const [download] = await Promise.all([
      owner.waitForEvent('download'),
      summary.getByRole('link', { name: 'Download certificate' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(
      /^commissioning-certificate-spindle-test-router-\d{4}-\d\d-\d\d\.pdf$/,
    );
    const dir = mkdtempSync(path.join(os.tmpdir(), 'rw-cert-'));
    const file = path.join(dir, 'certificate.pdf');
    await download.saveAs(file);
    const pdf = readFileSync(file);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = execFileSync('pdftotext', ['-layout', file, '-']).toString('utf8');
    expect(text).toContain('Spindle test router');
    expect(text).toContain(hash);
    expect(text).toContain('Not fitted yet on this bench machine');
    // The certificate's pages as PNG, to be looked at.
    execFileSync('pdftoppm', ['-png', '-r', '80', file, path.join(dir, 'page')]);
    for (const f of readdirSync(dir)
      .filter((n) => n.endsWith('.png'))
      .sort())
      renameSync(path.join(dir, f), path.join(SHOTS, `certificate-${f.replace(/^page-0*/, 'page-')}`));

    await owner.goto(`/machines/${machineId}?tab=history`);
    await expect(owner.getByRole('list', { name: 'History' })).toContainText('approved the machine as ready to cut');
    await expect(owner.getByRole('list', { name: 'History' })).toContainText('state: awaiting-approval → ready-to-cut');
    await snap(owner, 'machine-history');
  });

  test('the approved demo router: board, what drifted, tablet size, and the outbox', async ({ browser }) => {
    const viewer = await as(browser, DEMO.viewer);
    const list = await (await viewer.request.get('/api/machines')).json();
    const router = list.find((m: { name: string }) => m.name === 'Small router');
    await viewer.goto(`/machines/${router.id}`);
    await expect(viewer.getByLabel('Approval')).toContainText('Approved as ready to cut by Owen Pryce');
    await expect(viewer.getByRole('button', { name: 'Request approval' })).toBeHidden();
    await expect(viewer.getByRole('button', { name: /^Waive / })).toHaveCount(0);
    await snap(viewer, 'readiness-board-desktop');
    await viewer.getByRole('button', { name: 'What drifted' }).click();
    await expect(viewer.getByRole('table', { name: 'What drifted' })).toBeVisible();
    await snap(viewer, 'readiness-drift');
    // The demo router's certificate, with every real check, as PNG pages to look at.
    const cert = await viewer.request.get(`/api/machines/${router.id}/certificate.pdf`);
    expect(cert.headers()['content-type']).toBe('application/pdf');
    const dir = mkdtempSync(path.join(os.tmpdir(), 'rw-cert-'));
    writeFileSync(path.join(dir, 'router.pdf'), await cert.body());
    expect(execFileSync('pdftotext', [path.join(dir, 'router.pdf'), '-']).toString('utf8')).toContain(
      (await viewer.getByTestId('record-hash').textContent())!.trim(),
    );
    execFileSync('pdftoppm', ['-png', '-r', '80', path.join(dir, 'router.pdf'), path.join(dir, 'page')]);
    for (const f of readdirSync(dir)
      .filter((n) => n.endsWith('.png'))
      .sort())
      renameSync(path.join(dir, f), path.join(SHOTS, `certificate-router-${f.replace(/^page-0*/, 'page-')}`));
    await viewer.setViewportSize({ width: 820, height: 1180 });
    await viewer.getByRole('button', { name: 'Checks' }).click();
    await snap(viewer, 'readiness-board-tablet');

    const plasma = list.find((m: { name: string }) => m.name === 'Big plasma table');
    await viewer.setViewportSize({ width: 1366, height: 900 });
    await viewer.goto(`/machines/${plasma.id}`);
    await expect(viewer.getByRole('table', { name: 'Required checks' })).toContainText('Outside target');
    // A warning sits under the result it is about: the plasma X run has fewer targets than ISO 230-2 asks for.
    const xRun = viewer
      .getByRole('table', { name: 'Required checks' })
      .getByRole('row')
      .filter({ hasText: 'Repeat-and-reverse run' })
      .filter({ hasText: 'Axis X' });
    await expect(xRun.getByRole('list', { name: 'Warnings' })).toContainText('ISO 230-2 asks for at least 5 targets');
    await snap(viewer, 'readiness-board-plasma');

    const admin = await as(browser, DEMO.admin);
    await admin.goto('/outbox');
    await expect(admin.getByText('Ready to cut: Small router approved')).toBeVisible();
    await admin.getByText('Ready to cut: Small router approved').click();
    await expect(admin.getByRole('link', { name: /commissioning-certificate-small-router/ })).toBeVisible();
    await snap(admin, 'outbox');
  });
});
