// The HTML report's own script (inlined into the page by html-report.ts; it loads nothing from
// the network). It sorts and filters the overview, and draws a task's grids only when the task
// is open and near the screen, so a report of a thousand tasks opens quickly.
(function () {
  'use strict';

  const palette = JSON.parse(document.getElementById('palette').textContent);
  const numbersBox = document.getElementById('numbers');
  const filterBox = document.getElementById('filter');
  const verdictBox = document.getElementById('verdict');
  const shownCount = document.getElementById('shown-count');
  const table = document.getElementById('overview');
  const articles = Array.from(document.querySelectorAll('article.task'));
  /** Repaints of every canvas drawn so far, for the colour-number switch. */
  const painted = [];

  // ---- grids -------------------------------------------------------------------------------

  function lightColour(hex) {
    const n = parseInt(hex.slice(1), 16);
    return 0.299 * (n >> 16) + 0.587 * ((n >> 8) & 255) + 0.114 * (n & 255) > 140;
  }

  function cellSize(height, width) {
    const fit = Math.floor(240 / Math.max(height, width, 1));
    const smallest = numbersBox.checked ? 15 : 7;
    return Math.max(smallest, Math.min(24, fit));
  }

  /** Which cells differ between two grids of the same size (null when the sizes differ). */
  function differing(a, b) {
    if (!a || !b || a.length !== b.length || a[0].length !== b[0].length) return null;
    return a.map((row, r) => row.map((v, c) => v !== b[r][c]));
  }

  function countMarks(marks) {
    let n = 0;
    for (const row of marks) for (const m of row) if (m) n++;
    return n;
  }

  /** A canvas drawing of `rows`; `marks[r][c]` true frames a cell as differing. */
  function gridCanvas(rows, marks) {
    const canvas = document.createElement('canvas');
    const height = rows.length;
    const width = height > 0 ? rows[0].length : 0;
    canvas.setAttribute('role', 'img');
    canvas.dataset.differing = marks ? String(countMarks(marks)) : '0';
    const describe = 'grid ' + height + 'x' + width + (marks ? ', ' + canvas.dataset.differing + ' differing cells marked' : '');
    canvas.setAttribute('aria-label', describe);
    const paint = () => {
      const cell = cellSize(height, width);
      const scale = window.devicePixelRatio || 1;
      canvas.width = Math.round((width * cell + 1) * scale);
      canvas.height = Math.round((height * cell + 1) * scale);
      canvas.style.width = width * cell + 1 + 'px';
      canvas.style.height = height * cell + 1 + 'px';
      const g = canvas.getContext('2d');
      g.scale(scale, scale);
      g.fillStyle = '#3d4450';
      g.fillRect(0, 0, width * cell + 1, height * cell + 1);
      g.textAlign = 'center';
      g.textBaseline = 'middle';
      g.font = '600 ' + Math.floor(cell * 0.62) + 'px system-ui, sans-serif';
      for (let r = 0; r < height; r++) {
        for (let c = 0; c < width; c++) {
          const v = rows[r][c];
          const x = c * cell + 1;
          const y = r * cell + 1;
          if (v === null) {
            g.fillStyle = '#ffffff';
            g.fillRect(x, y, cell - 1, cell - 1);
            g.fillStyle = '#d5d8dd';
            for (let k = 0; k < cell - 1; k += 4) g.fillRect(x + k, y + k, 2, 2);
            continue;
          }
          g.fillStyle = palette[v].hex;
          g.fillRect(x, y, cell - 1, cell - 1);
          if (numbersBox.checked) {
            g.fillStyle = lightColour(palette[v].hex) ? '#111111' : '#ffffff';
            g.fillText(String(v), x + (cell - 1) / 2, y + (cell - 1) / 2 + 1);
          }
          if (marks && marks[r][c]) {
            g.lineWidth = 2;
            g.strokeStyle = '#ffffff';
            g.strokeRect(x + 1.5, y + 1.5, cell - 4, cell - 4);
            g.lineWidth = 1;
            g.strokeStyle = '#000000';
            g.strokeRect(x + 0.5, y + 0.5, cell - 2, cell - 2);
            if (!numbersBox.checked) {
              g.beginPath();
              g.moveTo(x + 3, y + 3);
              g.lineTo(x + cell - 4, y + cell - 4);
              g.moveTo(x + cell - 4, y + 3);
              g.lineTo(x + 3, y + cell - 4);
              g.strokeStyle = lightColour(palette[v].hex) ? '#000000' : '#ffffff';
              g.stroke();
            }
          }
        }
      }
    };
    paint();
    painted.push(paint);
    return canvas;
  }

  function element(tag, className, text) {
    const e = document.createElement(tag);
    if (className) e.className = className;
    if (text !== undefined) e.textContent = text;
    return e;
  }

  function figure(label, rows, marks, note) {
    const f = element('figure', 'grid');
    f.appendChild(gridCanvas(rows, marks));
    const size = rows.length + 'x' + (rows.length ? rows[0].length : 0);
    f.appendChild(element('figcaption', '', label + ' ' + size));
    if (note) f.appendChild(element('figcaption', 'note', note));
    return f;
  }

  function arrow() {
    return element('span', 'arrow', '\u2192');
  }

  // ---- one task ----------------------------------------------------------------------------

  function comparisonNote(attempt, expected) {
    if (!expected) return '';
    const marks = differing(attempt, expected);
    if (!marks) return 'size differs from expected';
    const n = countMarks(marks);
    return n === 0 ? 'matches expected' : n + (n === 1 ? ' cell differs' : ' cells differ');
  }

  function shownValue(value) {
    const box = element('div', 'value');
    if (value.kind === 'grid') box.appendChild(figure('', value.rows));
    else if (value.kind === 'text') box.appendChild(element('code', 'text', value.text));
    else if (value.kind === 'failure') {
      box.appendChild(element('strong', 'failed', 'failed'));
      box.appendChild(element('div', 'why', value.why));
    } else {
      box.appendChild(element('div', 'text', value.text));
      const row = element('div', 'pictures');
      for (const item of value.items.slice(0, 12)) row.appendChild(figure(item.label, item.rows));
      if (value.items.length > 12) row.appendChild(element('span', 'note', '\u2026 and ' + (value.items.length - 12) + ' more'));
      box.appendChild(row);
    }
    return box;
  }

  function drawTask(article) {
    if (article.dataset.drawn === 'yes') return;
    article.dataset.drawn = 'yes';
    const data = JSON.parse(document.getElementById('data-' + article.dataset.index).textContent);
    const body = article.querySelector('.drawings');
    body.textContent = '';
    if (data.train.length === 0) {
      body.appendChild(element('p', 'note', 'The task file could not be read, so there is nothing to draw.'));
      return;
    }
    body.appendChild(element('h3', '', 'Demonstrations'));
    data.train.forEach((pair, i) => {
      const row = element('div', 'pair');
      row.appendChild(figure('demonstration ' + (i + 1) + ' input', pair.input));
      row.appendChild(arrow());
      row.appendChild(figure('output', pair.output));
      body.appendChild(row);
    });
    body.appendChild(element('h3', '', 'Test inputs and predictions'));
    data.test.forEach((test, i) => {
      const row = element('div', 'pair test');
      row.appendChild(figure('test ' + (i + 1) + ' input', test.input));
      row.appendChild(arrow());
      if (test.attempts.length === 0) row.appendChild(element('span', 'note', 'no prediction'));
      test.attempts.forEach((attempt, k) => {
        row.appendChild(figure('attempt ' + (k + 1), attempt, test.expected ? differing(attempt, test.expected) : null, comparisonNote(attempt, test.expected)));
      });
      if (test.expected) row.appendChild(figure('expected', test.expected));
      else row.appendChild(element('span', 'note', 'expected output not in the task file'));
      body.appendChild(row);
    });
    if (data.steps.length > 0) {
      body.appendChild(element('h3', '', 'Every step on every demonstration (cheapest program)'));
      const scroller = element('div', 'steps-scroll');
      const steps = element('table', 'steps');
      const head = element('tr');
      head.appendChild(element('th', '', 'step'));
      data.train.forEach((_, i) => head.appendChild(element('th', '', 'demonstration ' + (i + 1))));
      steps.appendChild(head);
      for (const step of data.steps) {
        const tr = element('tr');
        const name = element('th', 'step-name');
        name.appendChild(element('code', '', step.name));
        name.appendChild(element('div', 'type', step.type));
        tr.appendChild(name);
        for (const value of step.values) {
          const td = element('td');
          td.appendChild(shownValue(value));
          tr.appendChild(td);
        }
        steps.appendChild(tr);
      }
      scroller.appendChild(steps);
      body.appendChild(scroller);
    }
  }

  function nearScreen(e) {
    const box = e.getBoundingClientRect();
    return box.bottom > -800 && box.top < window.innerHeight + 800;
  }

  const watcher = new IntersectionObserver(
    (entries) => {
      for (const entry of entries) {
        const article = entry.target;
        if (entry.isIntersecting && article.querySelector('details').open) drawTask(article);
      }
    },
    { rootMargin: '800px 0px' },
  );

  for (const article of articles) {
    watcher.observe(article);
    const details = article.querySelector('details');
    details.addEventListener('toggle', () => {
      if (details.open && nearScreen(article)) drawTask(article);
    });
  }

  function openTask(index) {
    const article = document.getElementById('task-' + index);
    if (!article) return;
    article.hidden = false;
    article.querySelector('details').open = true;
    drawTask(article);
    article.scrollIntoView({ block: 'start' });
  }

  // ---- overview: sorting and filtering -----------------------------------------------------

  const tbody = table.querySelector('tbody');
  table.querySelectorAll('th button').forEach((button, column) => {
    button.addEventListener('click', () => {
      const th = button.parentElement;
      const ascending = th.getAttribute('aria-sort') !== 'ascending';
      table.querySelectorAll('th').forEach((h) => h.removeAttribute('aria-sort'));
      th.setAttribute('aria-sort', ascending ? 'ascending' : 'descending');
      const numeric = th.dataset.numeric === 'yes';
      const key = (tr) => {
        const td = tr.children[column];
        return numeric ? Number(td.dataset.value) : td.dataset.value || td.textContent;
      };
      const rows = Array.from(tbody.rows);
      rows.sort((a, b) => {
        const x = key(a);
        const y = key(b);
        const order = numeric ? x - y : String(x).localeCompare(String(y));
        return ascending ? order : -order;
      });
      for (const tr of rows) tbody.appendChild(tr);
    });
  });

  function applyFilter() {
    const words = filterBox.value.trim().toLowerCase();
    const verdict = verdictBox.value;
    let shown = 0;
    for (const tr of Array.from(tbody.rows)) {
      const visible = (words === '' || tr.dataset.name.toLowerCase().includes(words)) && (verdict === 'all' || tr.dataset.verdict === verdict);
      tr.hidden = !visible;
      document.getElementById('task-' + tr.dataset.index).hidden = !visible;
      if (visible) shown++;
    }
    shownCount.textContent = 'showing ' + shown + ' of ' + tbody.rows.length + (tbody.rows.length === 1 ? ' task' : ' tasks');
  }

  filterBox.addEventListener('input', applyFilter);
  verdictBox.addEventListener('change', applyFilter);
  document.querySelectorAll('[data-show-verdict]').forEach((b) =>
    b.addEventListener('click', () => {
      verdictBox.value = b.dataset.showVerdict;
      applyFilter();
    }),
  );

  tbody.addEventListener('click', (event) => {
    const link = event.target.closest('a[data-open]');
    if (!link) return;
    event.preventDefault();
    openTask(link.dataset.open);
    history.replaceState(null, '', '#task-' + link.dataset.open);
  });

  document.getElementById('open-shown').addEventListener('click', () => {
    for (const a of articles) if (!a.hidden) a.querySelector('details').open = true;
  });
  document.getElementById('close-all').addEventListener('click', () => {
    for (const a of articles) a.querySelector('details').open = false;
  });

  numbersBox.addEventListener('change', () => {
    document.body.classList.toggle('numbers', numbersBox.checked);
    for (const paint of painted) paint();
  });

  applyFilter();
  const wanted = /^#task-(\d+)$/.exec(location.hash);
  if (wanted) openTask(wanted[1]);
})();
