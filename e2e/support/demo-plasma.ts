import type { Page } from '@playwright/test';

/** The demo plasma table, its Y2 (right) rail and its X axis, found through the API. */
export async function demoPlasma(page: Page) {
  const machines: { id: string; name: string }[] = await (await page.request.get('/api/machines')).json();
  const m = machines.find((x) => x.name === 'Big plasma table')!;
  const rails: { id: string; label: string }[] = await (await page.request.get(`/api/machines/${m.id}/rails`)).json();
  const axes: { id: string; name: string }[] = await (await page.request.get(`/api/machines/${m.id}/axes`)).json();
  return { id: m.id, rail: rails.find((r) => r.label === 'Y2 (right)')!, axis: axes.find((a) => a.name === 'X')! };
}
