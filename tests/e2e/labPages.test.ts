import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { type BrowserContext, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type RunningServer, startServer } from './startServer.ts';

const SHOTS = join(process.cwd(), 'tests', '.screenshots');
// The flags the machine notes give for root in a closed network: no sandbox, no GPU, and no
// background connections, which the network would refuse by the dozen.
const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

let server: RunningServer;
let context: BrowserContext;
let page: Page;
let profileDir: string;

const shot = (name: string) => page.screenshot({ path: join(SHOTS, `${name}.png`), fullPage: true });

beforeAll(async () => {
  await mkdir(SHOTS, { recursive: true });
  server = await startServer();
  profileDir = await mkdtemp(join(tmpdir(), 'fringe-ledger-chromium-'));
  context = await chromium.launchPersistentContext(profileDir, { executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS, viewport: { width: 1024, height: 768 } });
  page = context.pages()[0] ?? (await context.newPage());
}, 200_000);

afterAll(async () => {
  await context?.close();
  await server?.stop();
  if (profileDir) await rm(profileDir, { recursive: true, force: true });
});

describe('lab pages in a browser', () => {
  it('signs in with a demo key from the start output and shows the overview', async () => {
    expect(server.keys.technician).toMatch(/^flk_/);
    await page.goto(`${server.baseUrl}/lab`);
    expect(page.url()).toContain('/lab/sign-in');
    await page.getByLabel('API key').fill(server.keys.technician!);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.url()).toBe(`${server.baseUrl}/lab`);
    await expect.poll(() => page.getByRole('heading', { name: 'Awaiting a decision' }).isVisible()).toBe(true);
    const cookies = await context.cookies();
    expect(cookies.find((c) => c.name === 'fl_key')).toMatchObject({ httpOnly: true, sameSite: 'Strict', path: '/lab' });
    await shot('01-overview');
  });

  it('enters a reading by colour, previews it, saves it and sees the decision change', async () => {
    await page.getByRole('link', { name: 'UN-A2' }).first().click();
    await expect.poll(() => page.locator('h1 .badge').textContent()).toBe('Undecided within uncertainty');
    await page.getByRole('link', { name: 'Enter a reading' }).click();
    await page.getByLabel('upper notch root').check();
    await page.getByLabel('after unloading', { exact: true }).check();
    await page.getByLabel('Operator').fill('T. Haddad');
    await page.getByLabel('White-light colour').check();
    // Only the chosen method's inputs show (CSS :has): the Tardy fields are hidden now.
    expect(await page.getByLabel('Whole order below, n').isVisible()).toBe(false);
    await page.locator('label.swatch:has(input[value="580"])').click();
    await page.getByRole('button', { name: 'Preview the fringe order' }).click();
    await expect.poll(() => page.locator('.preview .big').textContent()).toBe('N = 1.0052 ± 0.0040');
    await shot('02-colour-preview');
    await page.getByRole('button', { name: 'Save this reading' }).click();
    await expect.poll(() => page.locator('h1 .badge').textContent()).toBe('Anneal first');
    expect(await page.locator('.flash').textContent()).toContain('Reading saved');
    await shot('03-model-after-reading');
  });

  it('opens the trend plots and a printable schedule', async () => {
    await page.getByRole('navigation').getByRole('link', { name: 'Trends' }).click();
    await expect.poll(() => page.locator('svg.plot').count()).toBeGreaterThanOrEqual(2);
    expect(await page.locator('svg.plot rect.box').count()).toBeGreaterThanOrEqual(2);
    await shot('04-trends');
    await page.goto(`${server.baseUrl}/lab`);
    await page.getByRole('link', { name: 'UN-A2' }).first().click();
    await page.getByRole('link', { name: 'Printable schedule with cautions' }).click();
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('heading', { name: 'Cautions' }).isVisible()).toBe(true);
    expect(await page.getByRole('navigation').isVisible()).toBe(false);
    await shot('05-schedule-print');
    await page.emulateMedia({ media: 'screen' });
  });

  it('shows an oven run with its plan against the oven log', async () => {
    await page.goto(`${server.baseUrl}/lab`);
    await page.getByRole('link', { name: 'SN-B1' }).first().click();
    await page.locator('a[href^="/lab/runs/"]').first().click();
    await expect.poll(() => page.locator('svg.plot path.measured').count()).toBe(1);
    expect(await page.locator('svg.plot path.planned').count()).toBe(1);
    expect(await page.getByRole('heading', { name: /Log comparison/ }).textContent()).toMatch(/passed/);
    await shot('06-oven-run');
  });
});
