import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { newAxis } from './support/machine-with-axis';
import { DEMO, signInAs, snap } from './support/session';

const PHONE = { width: 390, height: 844 };
const TABLET = { width: 820, height: 1180 };

async function trialsOf(request: APIRequestContext, axisId: string) {
  const res = await request.get(`/api/axes/${axisId}/travel-trials`);
  expect(res.status()).toBe(200);
  const body = await res.json();
  return (Array.isArray(body) ? body : body.items) as { id: string }[];
}

const cell = (page: Page, k: 'Commanded' | 'Measured', n: number) => page.getByLabel(`${k} move ${n}`, { exact: true });

test.describe('entry grids of the drives', () => {
  test('travel trial by keyboard: Enter to the next move, Tab skips the remove buttons, a removed move comes back with Undo, three moves are saved as three', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request, `Entry grid ${Date.now()}`);
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    await expect(page.getByRole('heading', { name: 'Axis X' })).toBeVisible();

    await cell(page, 'Commanded', 1).click();
    await page.keyboard.type('200');
    await page.keyboard.press('Tab');
    await expect(cell(page, 'Measured', 1)).toBeFocused();
    await page.keyboard.type('199.8');
    // Tab from the last cell of a move goes to the next move's first cell, not to "Remove move 1".
    await page.keyboard.press('Tab');
    await expect(cell(page, 'Commanded', 2)).toBeFocused();
    await page.keyboard.type('400');
    await page.keyboard.press('Tab');
    await page.keyboard.type('399.6');
    // Enter from the measured cell: the next move's commanded cell.
    await page.keyboard.press('Enter');
    await expect(cell(page, 'Commanded', 3)).toBeFocused();
    await page.keyboard.type('800');
    await page.keyboard.press('Tab');
    await page.keyboard.type('799.2');
    // Enter after the last move adds a move and goes to it; nothing is removed.
    await page.keyboard.press('Enter');
    await expect(cell(page, 'Commanded', 4)).toBeFocused();
    await page.keyboard.press('Enter');
    await expect(cell(page, 'Commanded', 5)).toBeFocused();
    await expect(cell(page, 'Measured', 3)).toHaveValue('799.2');
    await expect(cell(page, 'Commanded', 1)).toHaveValue('200');

    // The remove buttons are labelled and reachable by pointer, never by Tab.
    const remove2 = page.getByRole('button', { name: 'Remove move 2' });
    await expect(remove2).toHaveAttribute('tabindex', '-1');
    await remove2.click();
    await expect(cell(page, 'Commanded', 2)).toHaveValue('800');
    await expect(page.getByText('Removed move 2')).toBeVisible();
    await snap(page, 'drives-trial-removed-undo-desktop');
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect(cell(page, 'Commanded', 2)).toHaveValue('400');
    await expect(cell(page, 'Measured', 2)).toHaveValue('399.6');
    await expect(cell(page, 'Commanded', 3)).toHaveValue('800');

    // Enter on a remove button that has the focus (after a click) never removes.
    await page.getByRole('button', { name: 'Remove move 5' }).focus();
    await page.keyboard.press('Enter');
    await expect(cell(page, 'Commanded', 3)).toHaveValue('800');
    await expect(page.getByLabel(/^Commanded move/)).toHaveCount(5);

    await page.getByRole('button', { name: 'Record trial' }).click();
    const trial = page.getByRole('region', { name: 'Travel trial result' });
    await expect(trial.getByText('Outside target')).toBeVisible();
    const [saved] = await trialsOf(page.request, axisId);
    const full = await (await page.request.get(`/api/axes/${axisId}/travel-trials/${saved.id}`)).json();
    expect(full.moves.map((m: { commanded: number }) => m.commanded)).toEqual([200, 400, 800]);
  });

  test('repeat-and-reverse grid: its targets are the test program’s; Enter goes to the next row’s first cell, Tab along a row', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request, `Entry grid ${Date.now()}`);
    const program = await page.request.get(`/api/axes/${axisId}/test-program?kind=positioning`);
    expect(program.status()).toBe(200);
    const line = /\(Targets mm: ([^)]*)\)/.exec(await program.text());
    expect(line).not.toBeNull();
    const programTargets = line![1].split(',').map((t) => Number(t.trim()));
    expect(programTargets.length).toBeGreaterThanOrEqual(5);

    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    await expect(page.getByTestId('targets-source')).toContainText(
      'the same list the downloaded test program moves to',
    );
    const headers = page.getByLabel(/^Target \d+ \(mm\)$/);
    await expect(headers).toHaveCount(programTargets.length);
    const gridTargets = (await headers.evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value))).map(Number);
    expect(gridTargets).toEqual(programTargets);

    await page.getByLabel('Up 1, target 1', { exact: true }).click();
    await page.keyboard.type('5');
    await page.keyboard.press('Tab');
    await expect(page.getByLabel('Up 1, target 2', { exact: true })).toBeFocused();
    await page.keyboard.type('4');
    await page.keyboard.press('Enter');
    await expect(page.getByLabel('Down 1, target 1', { exact: true })).toBeFocused();
    await page.keyboard.press('Shift+Enter');
    await expect(page.getByLabel('Up 1, target 1', { exact: true })).toBeFocused();
    await expect(page.getByLabel('Up 1, target 2', { exact: true })).toHaveValue('4');
    // An indicator's readings each end in Enter: with it on, Enter moves target after target.
    await page.getByLabel('From an indicator').check();
    await page.getByLabel('Down 1, target 1', { exact: true }).click();
    await page.keyboard.type('-2');
    await page.keyboard.press('Enter');
    await expect(page.getByLabel('Down 1, target 2', { exact: true })).toBeFocused();
    await page.getByLabel('From an indicator').uncheck();

    for (const [size, name] of [
      [TABLET, 'tablet'],
      [PHONE, 'phone'],
    ] as const) {
      await page.setViewportSize(size);
      await page.getByRole('heading', { name: 'Record a travel trial' }).scrollIntoViewIfNeeded();
      await snap(page, `drives-trial-grid-${name}`);
      await page.getByRole('grid', { name: 'Repeat-and-reverse readings' }).scrollIntoViewIfNeeded();
      await snap(page, `drives-run-grid-${name}`);
    }
  });

  test('a check recorded outside target changes the machine header, the readiness board and the machines list without a reload', async ({
    page,
  }) => {
    await signInAs(page, DEMO.owner);
    const name = `Header refresh ${Date.now()}`;
    const { machineId, axisId } = await newAxis(page.request, name);
    // The safety walk answered, every other check waived, then approval requested: the machine awaits approval.
    const walk = await (await page.request.get(`/api/machines/${machineId}/safety-walk`)).json();
    for (const item of (walk.sections as { items: { id: string }[] }[]).flatMap((x) => x.items)) {
      const a = await page.request.put(`/api/machines/${machineId}/safety-walk/items/${encodeURIComponent(item.id)}`, {
        data: { answer: 'yes' },
      });
      expect(a.ok(), await a.text()).toBe(true);
    }
    const readiness = await (await page.request.get(`/api/machines/${machineId}/readiness`)).json();
    for (const c of readiness.checks as { key: string; status: string }[]) {
      if (c.status === 'within-target' || c.status === 'waived') continue;
      const w = await page.request.post(`/api/machines/${machineId}/checks/${encodeURIComponent(c.key)}/waiver`, {
        data: { reason: 'Not part of this browser test of the header' },
      });
      expect(w.ok(), await w.text()).toBe(true);
    }
    const req = await page.request.post(`/api/machines/${machineId}/approval-requests`);
    expect(req.ok(), await req.text()).toBe(true);

    await page.goto('/machines');
    const row = page.getByRole('row').filter({ hasText: name });
    await expect(row).toContainText('Awaiting approval');
    await row.getByRole('link', { name }).click();
    await expect(page.getByText('Awaiting approval', { exact: true })).toBeVisible();
    await expect(page.getByTestId('readiness-counts')).toContainText('0 outside');

    // To the axis inside the app, a trial that goes outside target, and back.
    await page.getByRole('tab', { name: 'Drives' }).click();
    await page.getByRole('table', { name: 'Axes' }).getByRole('link', { name: 'X' }).click();
    await expect(page.getByRole('heading', { name: 'Axis X' })).toBeVisible();
    await cell(page, 'Commanded', 1).fill('200');
    await cell(page, 'Measured', 1).fill('199.8');
    await cell(page, 'Commanded', 2).fill('400');
    await cell(page, 'Measured', 2).fill('399.6');
    await page.getByRole('button', { name: 'Record trial' }).click();
    await expect(page.getByRole('region', { name: 'Travel trial result' }).getByText('Outside target')).toBeVisible();

    // Back in the machine file (answers younger than the cache's 15 s would be shown as they were).
    await page.goBack();
    await page.getByRole('tab', { name: 'Readiness' }).click();
    await expect(page.getByTestId('readiness-counts')).toContainText('1 outside');
    await expect(page.getByText('Awaiting approval', { exact: true })).toHaveCount(0);
    await expect(page.getByText('Being built', { exact: true })).toBeVisible();
    await page.goBack();
    await expect(row).toContainText('Being built');
    await expect(row).toContainText('1 outside');
    expect(axisId).toBeTruthy();
  });
});
