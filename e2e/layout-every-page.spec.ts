import { expect, test, type Browser, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

// Every page and tab of the app at a phone's width (390 px) and a tablet's (820 px): nothing may
// scroll sideways, and every control a finger uses offers at least 44 × 44 px (WCAG 2.5.5).
// Screenshots of each land in e2e/screenshots/layout-<size>-<page>.png for people to look at.

const SIZES = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'tablet', width: 820, height: 1180 },
] as const;

const TARGET = 44;

const MACHINE_TABS = [
  'readiness',
  'overview',
  'rails',
  'drives',
  'frame',
  'safety',
  'templates',
  'evidence',
  'history',
];
const CALCULATORS = [
  'straightness',
  'parallelism',
  'squareness',
  'flatness',
  'drive',
  'travel-trial',
  'positioning',
  'screw-speed',
];

interface Visit {
  name: string;
  path: string;
  /** Who looks at it: pages differ by role. */
  as: keyof typeof DEMO;
}

interface Problem {
  what: string;
  width: number;
  height: number;
}

/** What on the page is wider than the window, and which controls are smaller than a fingertip. */
async function measure(
  page: Page,
): Promise<{ scrollWidth: number; innerWidth: number; wide: string[]; small: Problem[] }> {
  return page.evaluate((target) => {
    const describe = (el: Element) => {
      const name = (el.getAttribute('aria-label') ?? el.textContent ?? '').trim().replace(/\s+/g, ' ').slice(0, 40);
      const cls = [...el.classList]
        .filter((c) => c.startsWith('Mui') && !c.includes('-'))
        .slice(0, 2)
        .join('.');
      return `<${el.tagName.toLowerCase()}${el.getAttribute('role') ? ` role=${el.getAttribute('role')}` : ''}${cls ? ` .${cls}` : ''}> "${name}"`;
    };
    const visible = (el: Element) => {
      const r = el.getBoundingClientRect();
      if (r.width <= 1 || r.height <= 1) return false; // visually hidden (file inputs, native selects)
      if (el.closest('[aria-hidden="true"], [hidden]')) return false;
      const style = getComputedStyle(el);
      return style.visibility !== 'hidden' && style.display !== 'none';
    };
    // An inline text link inside a sentence is exempt (WCAG 2.5.5 "inline"): it is as tall as its line.
    const inlineInText = (el: Element) => {
      if (el.tagName !== 'A' || getComputedStyle(el).display !== 'inline') return false;
      const block = el.parentElement?.closest('p');
      return !!block && (block.textContent ?? '').trim().length > (el.textContent ?? '').trim().length;
    };
    const small: { what: string; width: number; height: number }[] = [];
    const controls = document.querySelectorAll(
      'button, a[href], [role="tab"], [role="button"], [role="checkbox"], [role="switch"], [role="combobox"], input:not([type="hidden"]), select, textarea',
    );
    for (const el of controls) {
      if (!visible(el) || inlineInText(el) || (el as HTMLButtonElement).disabled) continue;
      if (el.closest('.recharts-wrapper')) continue; // the charts' own legend is not a control
      // A text field's target is its whole box, not the bare <input> inside it.
      const box = el.closest('.MuiInputBase-root') ?? el;
      const r = box.getBoundingClientRect();
      if (r.width + 0.5 < target || r.height + 0.5 < target)
        small.push({ what: describe(el), width: Math.round(r.width), height: Math.round(r.height) });
    }
    const wide: string[] = [];
    for (const el of document.body.querySelectorAll('*')) {
      const r = el.getBoundingClientRect();
      if (r.right > window.innerWidth + 1 && r.width > 0 && !el.closest('[aria-hidden="true"]')) {
        const parent = el.parentElement?.getBoundingClientRect();
        // Only the outermost element that sticks out, and not what a scrolling box holds.
        if (parent && parent.right <= window.innerWidth + 1) {
          let scroller: Element | null = el.parentElement;
          let clipped = false;
          while (scroller && scroller !== document.body) {
            const o = getComputedStyle(scroller).overflowX;
            if (o === 'auto' || o === 'scroll' || o === 'hidden') clipped = true;
            scroller = scroller.parentElement;
          }
          if (!clipped) wide.push(`${describe(el)} right edge ${Math.round(r.right)} px`);
        }
      }
    }
    return {
      scrollWidth: document.documentElement.scrollWidth,
      innerWidth: window.innerWidth,
      wide: wide.slice(0, 5),
      small,
    };
  }, TARGET);
}

/** The page has drawn its data: nothing is still loading. */
async function settled(page: Page) {
  // The page's heading shows with its data; every part still loading shows a progress bar.
  await expect(page.getByRole('heading', { level: 1 }).first()).toBeVisible();
  await expect(page.locator('[role="progressbar"]:visible')).toHaveCount(0);
  await page.evaluate(() => document.fonts.ready);
}

async function demoIds(page: Page) {
  const machines: { id: string; name: string }[] = await (await page.request.get('/api/machines')).json();
  const plasma = machines.find((m) => m.name === 'Big plasma table')!;
  const rails: { id: string }[] = await (await page.request.get(`/api/machines/${plasma.id}/rails`)).json();
  const axes: { id: string }[] = await (await page.request.get(`/api/machines/${plasma.id}/axes`)).json();
  const patterns: { id: string }[] = await (await page.request.get(`/api/machines/${plasma.id}/hole-patterns`)).json();
  expect(rails.length && axes.length && patterns.length).toBeTruthy();
  // The approved demo router's certificate address, which anyone holding the paper opens.
  const router = machines.find((m) => m.name === 'Small router')!;
  const approvals: { verificationToken: string | null }[] = await (
    await page.request.get(`/api/machines/${router.id}/approvals`)
  ).json();
  const token = approvals.find((a) => a.verificationToken)?.verificationToken;
  const verify = token ? `/verify/${token}` : undefined;
  expect(verify).toMatch(/^\/verify\//);
  return { machine: plasma.id, rail: rails[0].id, axis: axes[0].id, pattern: patterns[0].id, verify: verify! };
}

function visitsFor(ids: Awaited<ReturnType<typeof demoIds>>): Visit[] {
  const m = `/machines/${ids.machine}`;
  return [
    { name: 'machines', path: '/machines', as: 'owner' },
    ...MACHINE_TABS.map((tab): Visit => ({ name: `machine-${tab}`, path: `${m}?tab=${tab}`, as: 'owner' })),
    { name: 'rail', path: `${m}/rails/${ids.rail}`, as: 'owner' },
    { name: 'axis', path: `${m}/axes/${ids.axis}`, as: 'owner' },
    { name: 'hole-pattern', path: `${m}/templates/${ids.pattern}`, as: 'owner' },
    { name: 'target-sets', path: '/target-sets', as: 'owner' },
    { name: 'activity', path: '/activity', as: 'owner' },
    ...CALCULATORS.map((calc): Visit => ({
      name: `calculators-${calc}`,
      path: `/calculators?calc=${calc}`,
      as: 'owner',
    })),
    // A builder records where an owner reviews: the entry forms show on these pages.
    { name: 'builder-machine-readiness', path: `${m}?tab=readiness`, as: 'builder' },
    { name: 'builder-machine-rails', path: `${m}?tab=rails`, as: 'builder' },
    { name: 'builder-rail', path: `${m}/rails/${ids.rail}`, as: 'builder' },
    { name: 'builder-bolt-down', path: `${m}/rails/${ids.rail}/bolt-down`, as: 'builder' },
    { name: 'technician-axis', path: `${m}/axes/${ids.axis}`, as: 'technician' },
    { name: 'people', path: '/people', as: 'admin' },
    { name: 'outbox', path: '/outbox', as: 'admin' },
  ];
}

async function pagesByRole(browser: Browser, size: (typeof SIZES)[number]) {
  const pages = new Map<keyof typeof DEMO, Page>();
  return async (who: keyof typeof DEMO) => {
    let page = pages.get(who);
    if (!page) {
      page = await (await browser.newContext({ viewport: { width: size.width, height: size.height } })).newPage();
      await signInAs(page, DEMO[who]);
      pages.set(who, page);
    }
    return page;
  };
}

for (const size of SIZES) {
  test(`every page at ${size.width} px: no sideways scroll, 44 px targets`, async ({ browser }) => {
    test.slow(); // some thirty pages, each measured and photographed
    const pageOf = await pagesByRole(browser, size);
    const ids = await demoIds(await pageOf('owner'));

    // The pages before sign-in first, on a context of their own.
    const guest = await (await browser.newContext({ viewport: { width: size.width, height: size.height } })).newPage();
    for (const [name, path] of [
      ['sign-in', '/sign-in'],
      ['forgot-password', '/forgot-password'],
      ['verify', ids.verify],
    ]) {
      await guest.goto(path);
      await settled(guest);
      await check(guest, `${size.name}-${name}`);
    }

    for (const visit of visitsFor(ids)) {
      const page = await pageOf(visit.as);
      await page.goto(visit.path);
      await settled(page);
      await check(page, `${size.name}-${visit.name}`);
    }
  });
}

async function check(page: Page, name: string) {
  const m = await measure(page);
  // The selected tab of a scrolling tab bar is scrolled into view, not left behind its edge.
  const tabs = await page.evaluate(() =>
    [...document.querySelectorAll('[role="tab"][aria-selected="true"]')].map((tab) => {
      const bar = tab.closest('.MuiTabs-scroller')!.getBoundingClientRect();
      const r = tab.getBoundingClientRect();
      return { tab: tab.textContent, inView: r.left >= bar.left - 1 && r.right <= bar.right + 1 };
    }),
  );
  for (const t of tabs) expect.soft(t.inView, `${name}: the selected tab "${t.tab}" is in view`).toBe(true);
  await snap(page, `layout-${name}`);
  expect.soft(m.scrollWidth, `${name} scrolls sideways: ${m.wide.join('; ')}`).toBeLessThanOrEqual(m.innerWidth);
  expect.soft(m.small, `${name}: controls under ${TARGET} px`).toEqual([]);
}
