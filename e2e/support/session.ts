import { expect, type Page } from '@playwright/test';
import path from 'node:path';

export const DEMO_PASSWORD = 'railwright-demo';
export const DEMO = {
  admin: 'admin@example.com',
  owner: 'owner@example.com',
  technician: 'tech@example.com',
  builder: 'builder@example.com',
  viewer: 'viewer@example.com',
  other: 'other@example.com',
} as const;

export async function signInAs(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
}

/** Screenshots land in e2e/screenshots/ (git-ignored) for people to look at after a run. */
export async function snap(page: Page, name: string) {
  await page.screenshot({ path: path.join(__dirname, '..', 'screenshots', `${name}.png`), fullPage: true });
}
