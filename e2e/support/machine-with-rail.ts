import { expect, type Page } from '@playwright/test';

export interface RailSpec {
  lengthMm: number;
  holePitchMm: number;
  firstHoleMm: number;
}

/** A new machine file made through its dialog, with one rail Y1 (left), left open on the rail's page. */
export async function newMachineWithRail(
  page: Page,
  name: string,
  rail: RailSpec,
  workArea = { x: 3000, y: 1500 },
  notes?: string,
) {
  await page.goto('/machines');
  await page.getByRole('button', { name: 'New machine' }).click();
  const dialog = page.getByRole('dialog', { name: 'New machine' });
  await dialog.getByLabel('Name').fill(name);
  await dialog.getByLabel('Work area X').fill(String(workArea.x));
  await dialog.getByLabel('Work area Y').fill(String(workArea.y));
  if (notes) await dialog.getByLabel('Notes').fill(notes);
  await dialog.getByRole('button', { name: 'Open machine file' }).click();
  await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
  await page.getByRole('tab', { name: 'Rails' }).click();
  await page.getByRole('button', { name: 'Add rail' }).click();
  const add = page.getByRole('dialog', { name: 'Add rail' });
  await add.getByLabel('Label').fill('Y1 (left)');
  await add.getByLabel('Axis').fill('Y1');
  await add.getByLabel('Length').fill(String(rail.lengthMm));
  await add.getByLabel('Hole pitch').fill(String(rail.holePitchMm));
  await add.getByLabel('First hole').fill(String(rail.firstHoleMm));
  await add.getByRole('button', { name: 'Add rail' }).click();
  await expect(add).toBeHidden();
  await page.getByRole('table', { name: 'Rails' }).getByRole('link', { name: 'Y1 (left)' }).click();
  await expect(page.getByRole('heading', { name: 'Rail Y1 (left)' })).toBeVisible();
}
