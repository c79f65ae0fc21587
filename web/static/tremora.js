// Tremora's one script: enhancements only; every page works without it.
// 1. The ranking table sorts in place when a column header is chosen (the links still work).
// 2. A screening's (or hazard map's) progress page follows the run and moves on when it is done.
// 3. The handout gets a print button.
(() => {
  'use strict';

  function sortTable(table, key, direction) {
    const body = table.tBodies[0];
    const rows = Array.from(body.rows);
    const valueOf = (row) => {
      const cell = row.querySelector(`[data-key="${key}"]`);
      const raw = cell ? cell.getAttribute('data-value') : '';
      if (raw === '' || raw === null) return null;
      const n = Number(raw);
      return Number.isNaN(n) ? raw : n;
    };
    const rank = (row) => Number(row.querySelector('[data-key="rank"]').getAttribute('data-value'));
    const sign = direction === 'ascending' ? 1 : -1;
    rows.sort((a, b) => {
      const va = valueOf(a);
      const vb = valueOf(b);
      if (va === null || vb === null) return va === vb ? rank(a) - rank(b) : va === null ? 1 : -1;
      const order = typeof va === 'string' ? va.localeCompare(vb) : va - vb;
      return sign * order || rank(a) - rank(b);
    });
    for (const row of rows) body.appendChild(row);
  }

  function enhanceSorting(table) {
    table.addEventListener('click', (event) => {
      const link = event.target.closest('a[data-sort]');
      if (!link) return;
      event.preventDefault();
      const key = link.getAttribute('data-sort');
      const th = link.closest('th');
      const current = th.getAttribute('aria-sort');
      const direction = current
        ? current === 'ascending'
          ? 'descending'
          : 'ascending'
        : link.getAttribute('data-first');
      for (const other of table.querySelectorAll('thead th')) {
        other.removeAttribute('aria-sort');
        const state = other.querySelector('.sort-state');
        if (state) state.textContent = '';
      }
      th.setAttribute('aria-sort', direction);
      const state = th.querySelector('.sort-state');
      if (state)
        state.textContent = ` (${table.getAttribute(`data-label-${direction}`) || direction})`;
      sortTable(table, key, direction);
      const url = new URL(window.location.href);
      url.searchParams.set('sort', key);
      url.searchParams.set('dir', direction);
      url.hash = '';
      history.replaceState(null, '', url);
      link.focus();
    });
  }

  function followRun(box) {
    const id = box.getAttribute('data-run');
    const statusUrl = box.getAttribute('data-status-url') || `/api/runs/${encodeURIComponent(id)}`;
    const doneUrl = box.getAttribute('data-done-url');
    const bar = box.querySelector('progress');
    const percent = box.querySelector('.run-percent');
    const tick = async () => {
      try {
        const answer = await fetch(statusUrl, { headers: { Accept: 'application/json' } });
        if (answer.ok) {
          const run = await answer.json();
          if (bar) bar.value = run.progress;
          if (percent) percent.textContent = `${Math.round(run.progress * 100)}%`;
          if (run.status === 'done') {
            window.location.assign(doneUrl);
            return;
          }
          if (run.status !== 'queued' && run.status !== 'running') {
            window.location.reload();
            return;
          }
        }
      } catch {
        // The service may be restarting; try again at the next tick.
      }
      setTimeout(tick, 1000);
    };
    setTimeout(tick, 1000);
  }

  function addPrintButton(slot) {
    const button = document.createElement('button');
    button.type = 'button';
    button.className = 'button-primary';
    button.textContent =
      slot.closest('[data-print-label]')?.getAttribute('data-print-label') ||
      document.documentElement.getAttribute('data-print-label') ||
      'Print';
    button.addEventListener('click', () => window.print());
    slot.appendChild(button);
  }

  document.addEventListener('DOMContentLoaded', () => {
    for (const table of document.querySelectorAll('table[data-sortable="true"]'))
      enhanceSorting(table);
    const box = document.querySelector(
      '.run-status[data-status="queued"], .run-status[data-status="running"]',
    );
    if (box) followRun(box);
    for (const slot of document.querySelectorAll('[data-print-button]')) addPrintButton(slot);
  });
})();
