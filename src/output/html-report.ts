/**
 * The HTML report: one self-contained page (its style, script and data inlined; nothing is
 * fetched) with an overview of a run that sorts and filters, and per task its grids, the
 * programs found, the predictions beside the expected outputs and every step's value. Grids
 * are drawn by the page's script only when a task is open and near the screen.
 */
import { readFileSync } from 'node:fs';
import type { ReportTask, Verdict } from './report-data.ts';
import { HARBOUR_PALETTE } from './terminal-grid.ts';

export interface ReportOptions {
  readonly title: string;
  /** One line under the title: what the report was made from. */
  readonly source: string;
  /** Start with colour numbers printed inside the cells. */
  readonly numbers?: boolean;
}

export const VERDICT_WORDS: Readonly<Record<Verdict, string>> = {
  solved: 'solved',
  wrong: 'fit, but missed a test',
  fitted: 'fit (no test outputs)',
  'not found': 'no program found',
  error: 'error',
};

const VERDICT_ORDER: readonly Verdict[] = ['solved', 'wrong', 'fitted', 'not found', 'error'];

/** Tasks open (and drawn as they scroll into view) from the start when there are at most this many. */
const OPEN_UP_TO = 40;

export function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** JSON that is safe inside a <script> element. */
function scriptJson(data: unknown): string {
  return JSON.stringify(data).replace(/</g, '\\u003c').replace(/\u2028/g, '\\u2028').replace(/\u2029/g, '\\u2029');
}

function asset(name: string): string {
  return readFileSync(new URL(name, import.meta.url), 'utf8');
}

function verdictClass(v: Verdict): string {
  return `verdict v-${v.replace(' ', '-')}`;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

function overviewRow(t: ReportTask, i: number): string {
  return [
    `<tr data-index="${i}" data-name="${escapeHtml(t.name)}" data-verdict="${t.verdict}">`,
    `<td><a href="#task-${i}" data-open="${i}">${escapeHtml(t.name)}</a></td>`,
    `<td data-value="${VERDICT_ORDER.indexOf(t.verdict)}"><span class="${verdictClass(t.verdict)}">${VERDICT_WORDS[t.verdict]}</span></td>`,
    `<td class="number" data-value="${t.seconds}">${t.seconds.toFixed(2)}</td>`,
    `<td class="number" data-value="${t.bits ?? 1e9}">${t.bits ?? '–'}</td>`,
    `<td>${escapeHtml(t.stop)}</td>`,
    '</tr>',
  ].join('');
}

function taskArticle(t: ReportTask, i: number, open: boolean): string {
  const facts = [`${t.seconds.toFixed(2)} s`, t.bits !== null ? `${t.bits} bits` : undefined, `search: ${t.stop}`].filter((f) => f !== undefined).join(' · ');
  const programs = t.programs
    .map((p, k) => {
      const heading = t.programs.length > 1 ? `attempt ${k + 1}, ` : '';
      return `<pre class="program" data-program="${k}"><span class="bits">-- ${heading}${p.bits} bits</span>\n${escapeHtml(p.text.trimEnd())}</pre>`;
    })
    .join('\n');
  return [
    `<article class="task" id="task-${i}" data-index="${i}" data-verdict="${t.verdict}">`,
    `<h2><span class="name">${escapeHtml(t.name)}</span> <span class="${verdictClass(t.verdict)}">${VERDICT_WORDS[t.verdict]}</span> <span class="facts">${escapeHtml(facts)}</span></h2>`,
    `<div class="file note">${escapeHtml(t.file)}</div>`,
    t.error !== undefined ? `<p class="problem">${escapeHtml(t.error)}</p>` : '',
    t.note !== undefined ? `<p class="note">${escapeHtml(t.note)}</p>` : '',
    programs,
    `<details${open ? ' open' : ''}><summary>grids: demonstrations, test predictions and every step</summary><div class="drawings"><p class="note">drawn when scrolled into view</p></div></details>`,
    `<script type="application/json" id="data-${i}">${scriptJson(t)}</script>`,
    '</article>',
  ].join('\n');
}

/** The whole page. */
export function renderReport(tasks: readonly ReportTask[], options: ReportOptions): string {
  const counts = VERDICT_ORDER.map((v) => ({ v, n: tasks.filter((t) => t.verdict === v).length })).filter((c) => c.n > 0);
  const palette = HARBOUR_PALETTE.map((e, colour) => ({
    colour,
    name: e.name,
    hex: `#${[e.red, e.green, e.blue].map((x) => x.toString(16).padStart(2, '0')).join('')}`,
  }));
  const open = tasks.length <= OPEN_UP_TO;
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; script-src 'unsafe-inline'; img-src data:">
<title>${escapeHtml(options.title)}</title>
<style>
${asset('./report-page.css')}
</style>
</head>
<body${options.numbers ? ' class="numbers"' : ''}>
<header class="masthead">
<h1>${escapeHtml(options.title)}</h1>
<p>${escapeHtml(options.source)} · ${plural(tasks.length, 'task')}</p>
</header>
<main>
<div class="tally">
${counts.map((c) => `<button type="button" data-show-verdict="${c.v}"><strong>${c.n}</strong>${VERDICT_WORDS[c.v]}</button>`).join('\n')}
<button type="button" data-show-verdict="all"><strong>${tasks.length}</strong>in all</button>
</div>
<div class="controls">
<label>task name <input type="search" id="filter" placeholder="part of a name" autocomplete="off"></label>
<label>outcome <select id="verdict"><option value="all">all</option>${VERDICT_ORDER.map((v) => `<option value="${v}">${VERDICT_WORDS[v]}</option>`).join('')}</select></label>
<label><input type="checkbox" id="numbers"${options.numbers ? ' checked' : ''}> colour numbers in cells</label>
<button type="button" id="open-shown">open the tasks shown</button>
<button type="button" id="close-all">close all</button>
<span id="shown-count"></span>
</div>
<table id="overview">
<thead><tr><th><button type="button">task</button></th><th><button type="button">outcome</button></th><th data-numeric="yes"><button type="button">seconds</button></th><th data-numeric="yes"><button type="button">bits</button></th><th><button type="button">search stopped</button></th></tr></thead>
<tbody>
${tasks.map(overviewRow).join('\n')}
</tbody>
</table>
<p class="note">Colours: ${palette.map((p) => `${p.colour} ${escapeHtml(p.name)}`).join(', ')}. Cells framed with a cross differ from the expected output.</p>
${tasks.map((t, i) => taskArticle(t, i, open)).join('\n')}
</main>
<script type="application/json" id="palette">${scriptJson(palette)}</script>
<script>
${asset('./report-page.js')}
</script>
</body>
</html>
`;
}
