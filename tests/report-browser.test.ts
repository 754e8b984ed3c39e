// The HTML report in a real browser: the Chromium of the Debian package `chromium`, driven by
// playwright-core (no browser is downloaded). This test solves the demo tasks under a candidate
// cap (so the outcome does not depend on timing) with `pithy solve --json`, writes the report of
// those results with `pithy report`, opens it, and checks what a reader sees:
//   1. the overview has one row and one task section per demo task file (counted from the folder),
//   2. every program the solver printed appears, as text, in its task's section,
//   3. the tally of outcomes agrees with the results file,
//   4. typing one task's name in the filter leaves exactly that task, and opening it draws its grids
//      (one canvas per demonstration input and output at least), with differences marked nowhere
//      for a solved task,
//   5. a screenshot of the window showing the opened task is not blank: it has many distinct colours, among them
//      colours of the harbour palette,
//   6. the page asked for nothing over the network,
// and that `report` refuses to overwrite its output without --force.
// It skips with a message where /usr/bin/chromium is absent (.ci/run installs it).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inflateSync } from 'node:zlib';
import { chromium, type BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HARBOUR_PALETTE } from '../src/output/terminal-grid.ts';

const CHROMIUM = '/usr/bin/chromium';
const root = new URL('../', import.meta.url).pathname;
const demo = join(root, 'tasks-demo');
const pithy = (...args: string[]) => spawnSync(process.execPath, [join(root, 'bin', 'pithy.js'), ...args], { encoding: 'utf8', cwd: root });

if (!existsSync(CHROMIUM)) console.warn(`tests/report-browser.test.ts: skipped, ${CHROMIUM} is absent (install the Debian package chromium)`);

/** The distinct RGB colours of an 8-bit RGB or RGBA PNG (non-interlaced), decoded with node:zlib. */
export function pngColours(png: Buffer): Set<number> {
  let offset = 8;
  let width = 0;
  let height = 0;
  let channels = 0;
  const data: Buffer[] = [];
  while (offset < png.length) {
    const length = png.readUInt32BE(offset);
    const type = png.toString('latin1', offset + 4, offset + 8);
    const body = png.subarray(offset + 8, offset + 8 + length);
    if (type === 'IHDR') {
      width = body.readUInt32BE(0);
      height = body.readUInt32BE(4);
      if (body[8] !== 8 || body[12] !== 0) throw new Error('only 8-bit non-interlaced PNGs are decoded here');
      channels = body[9] === 6 ? 4 : body[9] === 2 ? 3 : 0;
      if (channels === 0) throw new Error(`PNG colour type ${body[9]} not decoded here`);
    } else if (type === 'IDAT') data.push(body);
    offset += 12 + length;
  }
  const raw = inflateSync(Buffer.concat(data));
  const stride = width * channels;
  const previous = Buffer.alloc(stride);
  const line = Buffer.alloc(stride);
  const colours = new Set<number>();
  for (let y = 0; y < height; y++) {
    const start = y * (stride + 1);
    const filter = raw[start]!;
    for (let x = 0; x < stride; x++) {
      const value = raw[start + 1 + x]!;
      const a = x >= channels ? line[x - channels]! : 0;
      const b = previous[x]!;
      const c = x >= channels ? previous[x - channels]! : 0;
      let out: number;
      if (filter === 0) out = value;
      else if (filter === 1) out = value + a;
      else if (filter === 2) out = value + b;
      else if (filter === 3) out = value + ((a + b) >> 1);
      else {
        const p = a + b - c;
        const pa = Math.abs(p - a);
        const pb = Math.abs(p - b);
        const pc = Math.abs(p - c);
        out = value + (pa <= pb && pa <= pc ? a : pb <= pc ? b : c);
      }
      line[x] = out & 255;
    }
    for (let x = 0; x < width; x++) colours.add((line[x * channels]! << 16) | (line[x * channels + 1]! << 8) | line[x * channels + 2]!);
    line.copy(previous);
  }
  return colours;
}

describe.skipIf(!existsSync(CHROMIUM))('the HTML report in Chromium', () => {
  const folder = mkdtempSync(join(tmpdir(), 'pithy-report-'));
  const profile = mkdtempSync(join(tmpdir(), 'pithy-chromium-profile-'));
  const results = join(folder, 'demo-results.json');
  const page = join(folder, 'demo.html');
  const shot = process.env.PITHY_KEEP_SCREENSHOT ?? join(folder, 'opened-task.png');
  const demoTasks = readdirSync(demo).filter((f) => f.endsWith('.json')).map((f) => f.replace(/\.json$/, ''));
  let browser: BrowserContext;
  let reports: { task: string; status: string; solutions: { program: string; bits: number }[] }[];
  const requests: string[] = [];

  beforeAll(async () => {
    const solved = pithy('solve', demo, '--json', '--max-candidates', '40000', '--time-limit', '60', '--jobs', '2');
    expect(solved.status, solved.stderr).toBe(0);
    writeFileSync(results, solved.stdout);
    reports = JSON.parse(solved.stdout) as typeof reports;
    const made = pithy('report', results, '--out', page);
    expect(made.status, made.stderr).toBe(0);
    // The empty profile folder is Chromium's --user-data-dir (playwright passes it as that flag).
    browser = await chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM,
      headless: true,
      viewport: { width: 1280, height: 900 },
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
  });

  afterAll(async () => {
    await browser?.close();
    rmSync(profile, { recursive: true, force: true });
    rmSync(folder, { recursive: true, force: true });
  });

  it('shows one overview row and one section per demo task, every program found, and a tally that agrees with the results', async () => {
    const tab = await browser.newPage();
    tab.on('request', (r) => {
      if (!r.url().startsWith('file:')) requests.push(r.url());
    });
    await tab.goto(`file://${page}`);
    expect(await tab.locator('#overview tbody tr').count()).toBe(demoTasks.length);
    expect(await tab.locator('article.task').count()).toBe(demoTasks.length);
    const names = await tab.locator('#overview tbody tr td:first-child').allTextContents();
    expect([...names].sort()).toEqual([...demoTasks].sort());
    for (const report of reports) {
      const article = tab.locator('article.task', { has: tab.locator('h2 .name', { hasText: new RegExp(`^${report.task}$`) }) });
      const shown = await article.locator('pre.program').allTextContents();
      expect(shown.length).toBe(report.solutions.length);
      report.solutions.forEach((s, i) => expect(shown[i]).toContain(s.program.trimEnd()));
    }
    const found = reports.filter((r) => r.status === 'found').length;
    expect(found).toBeGreaterThan(0);
    // Every found demo task has its test outputs, so each is either solved or fit-but-missed.
    const solvedRows = await tab.locator('#overview tbody tr[data-verdict="solved"]').count();
    const wrongRows = await tab.locator('#overview tbody tr[data-verdict="wrong"]').count();
    const notFoundRows = await tab.locator('#overview tbody tr[data-verdict="not found"]').count();
    expect(solvedRows + wrongRows).toBe(found);
    expect(notFoundRows).toBe(reports.length - found);
    await tab.close();
  });

  it('filters to one task, opens it, draws its grids and takes a screenshot that is not blank', async () => {
    const tab = await browser.newPage();
    tab.on('request', (r) => {
      if (!r.url().startsWith('file:')) requests.push(r.url());
    });
    await tab.goto(`file://${page}`);
    const chosen = reports.find((r) => r.status === 'found')!;
    await tab.fill('#filter', chosen.task);
    const visibleRows = tab.locator('#overview tbody tr:not([hidden])');
    expect(await visibleRows.count()).toBe(1);
    expect(await tab.locator('article.task:not([hidden])').count()).toBe(1);
    expect(await tab.locator('#shown-count').textContent()).toBe(`showing 1 of ${demoTasks.length} tasks`);
    await visibleRows.locator('a').click();
    const article = tab.locator('article.task:not([hidden])');
    await article.locator('.drawings canvas').first().waitFor();
    const task = JSON.parse(readFileSync(join(demo, `${chosen.task}.json`), 'utf8')) as { train: unknown[]; test: unknown[] };
    // Demonstration inputs and outputs, test inputs and at least one attempt each, and the step table.
    expect(await article.locator('.drawings canvas').count()).toBeGreaterThanOrEqual(2 * task.train.length + 2 * task.test.length);
    expect(await article.locator('table.steps tr').count()).toBeGreaterThan(1);
    // What the reader sees after opening it: the window, scrolled to the task.
    await tab.screenshot({ path: shot });
    const colours = pngColours(readFileSync(shot));
    expect(colours.size).toBeGreaterThan(20);
    const harbour = HARBOUR_PALETTE.map((e) => (e.red << 16) | (e.green << 8) | e.blue);
    expect(harbour.filter((c) => colours.has(c)).length).toBeGreaterThanOrEqual(2);
    await tab.close();
  });

  it('asked for nothing over the network', () => {
    expect(requests).toEqual([]);
  });

  it('refuses to overwrite the report without --force', () => {
    const before = readFileSync(page, 'utf8');
    const again = pithy('report', results, '--out', page);
    expect(again.status).toBe(2);
    expect(again.stderr).toContain('already exists');
    expect(readFileSync(page, 'utf8')).toBe(before);
  });
});
