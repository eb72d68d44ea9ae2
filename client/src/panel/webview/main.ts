/**
 * The summary panel inside the webview: renders the model the extension posts (table,
 * selected check's requirements, diagrams and derivation), sorts, keeps the selection,
 * and asks the extension to reveal a block. No numbers are computed here.
 */
import type { DerivationItem, FromPanel, PanelDetail, PanelModel, PanelRow, ToPanel } from '../protocol';

interface VsCodeApi {
  postMessage(message: FromPanel): void;
  getState(): PanelState | undefined;
  setState(state: PanelState): void;
}

interface PanelState {
  sortCol?: SortCol;
  sortDir?: 'ascending' | 'descending';
  selected?: string;
}

type SortCol = 'id' | 'title' | 'method' | 'criterion' | 'n_f' | 'n_y' | 'life' | 'status';

declare function acquireVsCodeApi(): VsCodeApi;

const vscode = acquireVsCodeApi();
const state: PanelState = vscode.getState() ?? {};
let model: PanelModel = { state: 'no-note', rows: [], details: [] };

const $ = <T extends HTMLElement>(id: string) => document.getElementById(id) as T;
const rowsEl = $('rows');
const detailEl = $('detail');
const emptyEl = $('empty');
const resultsEl = $('results');
const noteEl = $('note');
const liveEl = $('live');

const STATUS_TEXT: Record<PanelRow['status'], string> = {
  pass: '✓ pass',
  fail: '✗ fail',
  error: '! error',
  unchecked: '– no requirement',
};
/** Where a value comes from, in words (the core's origin codes). */
const ORIGIN_TEXT: Record<string, string> = {
  stated: 'stated in the note',
  computed: 'computed',
  default: 'default, not stated',
  library: 'material library',
  reference: 'reference value',
};
const STATUS_ORDER: Record<PanelRow['status'], number> = { error: 0, fail: 1, unchecked: 2, pass: 3 };

function el<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  attrs: Record<string, string> = {},
  ...children: Array<Node | string>
): HTMLElementTagNameMap[K] {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) e.setAttribute(k, v);
  for (const c of children) e.append(c);
  return e;
}

function sortValue(r: PanelRow, col: SortCol): number | string | null {
  switch (col) {
    case 'n_f':
    case 'n_y':
      return r[col].sort;
    case 'life':
      return r.life.sort;
    case 'status':
      return STATUS_ORDER[r.status];
    default:
      return r[col].toLowerCase();
  }
}

function sortedRows(): PanelRow[] {
  const rows = [...model.rows];
  const col = state.sortCol;
  if (!col) return rows;
  const dir = state.sortDir === 'descending' ? -1 : 1;
  return rows.sort((a, b) => {
    const va = sortValue(a, col);
    const vb = sortValue(b, col);
    // Empty cells last, whatever the direction.
    if (va === null && vb === null) return a.index - b.index;
    if (va === null) return 1;
    if (vb === null) return -1;
    const c =
      typeof va === 'number' && typeof vb === 'number' ? va - vb : String(va).localeCompare(String(vb));
    return c === 0 ? a.index - b.index : c * dir;
  });
}

function renderHeaders(): void {
  for (const th of Array.from(document.querySelectorAll<HTMLTableCellElement>('th[data-col]'))) {
    const col = th.dataset.col as SortCol;
    th.setAttribute('aria-sort', state.sortCol === col ? (state.sortDir ?? 'ascending') : 'none');
  }
}

function renderRows(): void {
  rowsEl.replaceChildren();
  const selected = selectedKey();
  for (const r of sortedRows()) {
    const tr = el('tr', {
      tabindex: r.key === selected ? '0' : '-1',
      'data-key': r.key,
      'data-index': String(r.index),
      'aria-selected': String(r.key === selected),
      class: `status-${r.status}`,
      title: `Line ${r.line}: Enter or click shows the block`,
    });
    tr.append(
      el('th', { scope: 'row' }, el('code', {}, r.id)),
      el('td', {}, r.title),
      el('td', {}, r.method),
      el('td', {}, r.criterion),
      el('td', { class: 'num' }, r.n_f.text),
      el('td', { class: 'num' }, r.n_y.text),
      el('td', { class: 'num', title: r.life.meaning }, r.life.text ? `${r.life.name} ${r.life.text}` : ''),
      el('td', { class: 'status' }, el('span', { class: `badge badge-${r.status}` }, STATUS_TEXT[r.status])),
    );
    rowsEl.append(tr);
  }
}

function selectedKey(): string | undefined {
  if (state.selected && model.rows.some((r) => r.key === state.selected)) return state.selected;
  return model.rows[0]?.key;
}

function renderDetail(): void {
  const key = selectedKey();
  const d = model.details.find((x) => x.key === key);
  detailEl.replaceChildren();
  if (!d) return;
  detailEl.append(el('h2', { id: 'detail-heading' }, d.heading), el('p', { class: 'subtitle' }, d.subtitle));
  const { errors, warnings } = d.problems;
  if (errors + warnings > 0) {
    const plural = (n: number, w: string) => `${n} ${w}${n === 1 ? '' : 's'}`;
    detailEl.append(
      el(
        'p',
        { class: errors > 0 ? 'problems has-errors' : 'problems' },
        `${plural(errors, 'error')}, ${plural(warnings, 'warning')} in this block: see the underlines in the editor or the Problems view.`,
      ),
    );
  }
  if (d.requirements.length > 0) {
    const ul = el('ul', { class: 'requirements' });
    for (const r of d.requirements) {
      const mark = r.met === true ? '✓' : r.met === false ? '✗' : '?';
      const cls = r.met === true ? 'met' : r.met === false ? 'not-met' : 'unknown';
      ul.append(
        el(
          'li',
          { class: cls },
          el('span', { class: 'mark', 'aria-hidden': 'true' }, mark),
          ` ${r.text}: ${r.actual}`,
          el(
            'span',
            { class: 'visually-hidden' },
            r.met === true ? ' (met)' : r.met === false ? ' (not met)' : ' (not evaluated)',
          ),
        ),
      );
    }
    detailEl.append(ul);
  } else {
    detailEl.append(
      el('p', { class: 'muted' }, 'No requirement: add a `require:` line to judge this check.'),
    );
  }
  if (d.diagrams.length > 0) {
    const fig = el('div', { class: 'diagrams' });
    for (const g of d.diagrams) {
      const f = el('figure', { class: `diagram diagram-${g.kind}`, 'data-kind': g.kind });
      // The SVG comes from the core's diagram functions: escaped text, no scripts, no external references.
      f.innerHTML = g.svg;
      fig.append(f);
    }
    detailEl.append(fig);
  } else {
    detailEl.append(el('p', { class: 'muted' }, 'No diagram: the check has no numbers to draw yet.'));
  }
  for (const t of d.tables) detailEl.append(renderTable(t));
  detailEl.append(renderDerivation(d.derivation));
}

function renderTable(t: PanelDetail['tables'][number]): HTMLElement {
  const table = el('table', { class: 'extra' }, el('caption', {}, t.title));
  table.append(el('thead', {}, el('tr', {}, ...t.columns.map((c) => el('th', { scope: 'col' }, c)))));
  table.append(el('tbody', {}, ...t.rows.map((r) => el('tr', {}, ...r.map((c) => el('td', {}, c))))));
  return table;
}

function renderDerivation(items: DerivationItem[]): HTMLElement {
  const section = el('section', { class: 'derivation', 'aria-labelledby': 'derivation-heading' });
  section.append(el('h3', { id: 'derivation-heading' }, 'Derivation'));
  const ol = el('ol', {});
  for (const it of items) {
    const li = el('li', { class: `origin-${it.origin}` });
    li.append(
      el(
        'div',
        { class: 'line' },
        el('code', { class: 'name' }, it.name),
        ' = ',
        el('strong', {}, it.display),
        el('span', { class: 'origin' }, ORIGIN_TEXT[it.origin] ?? it.origin),
        el('span', { class: 'meaning' }, it.meaning),
      ),
    );
    if (it.formula) li.append(el('div', { class: 'formula' }, el('code', {}, it.formula)));
    if (it.inputs) li.append(el('div', { class: 'inputs' }, `with ${it.inputs}`));
    if (it.tool)
      li.append(
        el('div', { class: 'tool' }, `stated in place of what fatigue-notes would compute: ${it.tool}`),
      );
    if (it.assumption) li.append(el('div', { class: 'assumption' }, `assumed: ${it.assumption}`));
    for (const n of it.notes ?? []) li.append(el('div', { class: 'note' }, n));
    if (it.source) li.append(el('div', { class: 'source' }, it.source));
    ol.append(li);
  }
  section.append(ol);
  return section;
}

function render(): void {
  noteEl.textContent = model.fileName ?? '';
  const empty = model.state !== 'note';
  emptyEl.hidden = !empty;
  resultsEl.hidden = empty;
  if (empty) {
    emptyEl.replaceChildren();
    if (model.state === 'no-note') {
      emptyEl.append(
        el('h2', {}, 'No note open'),
        el(
          'p',
          {},
          'Open a Markdown note that contains a ```fatigue block: its checks appear here with their safety factors, diagrams and derivations.',
        ),
      );
    } else if (model.state === 'no-checks') {
      emptyEl.append(
        el('h2', {}, 'No fatigue checks in this note'),
        el(
          'p',
          {},
          'Add a fenced block whose info string is `fatigue` and an id, or run "fatigue-notes: Insert a new check…" from the command palette.',
        ),
      );
    } else {
      emptyEl.append(
        el('h2', {}, 'No results'),
        el('p', {}, model.message ?? 'The checks could not be evaluated.'),
      );
    }
    return;
  }
  renderHeaders();
  renderRows();
  renderDetail();
}

function select(tr: HTMLTableRowElement, reveal: boolean): void {
  const key = tr.dataset.key;
  const index = Number(tr.dataset.index);
  if (!key) return;
  const changed = state.selected !== key;
  state.selected = key;
  vscode.setState(state);
  for (const r of Array.from(rowsEl.querySelectorAll<HTMLTableRowElement>('tr'))) {
    const on = r === tr;
    r.setAttribute('aria-selected', String(on));
    r.tabIndex = on ? 0 : -1;
  }
  if (changed) {
    renderDetail();
    const row = model.rows.find((r) => r.key === key);
    if (row) liveEl.textContent = `${row.id}: ${STATUS_TEXT[row.status]}`;
  }
  vscode.postMessage(reveal ? { type: 'reveal', index, key } : { type: 'select', index, key });
}

rowsEl.addEventListener('click', (e) => {
  const tr = (e.target as HTMLElement).closest('tr');
  if (tr instanceof HTMLTableRowElement) {
    tr.focus();
    select(tr, true);
  }
});

rowsEl.addEventListener('keydown', (e) => {
  const tr = (e.target as HTMLElement).closest('tr');
  if (!(tr instanceof HTMLTableRowElement)) return;
  const move = (next: Element | null) => {
    if (next instanceof HTMLTableRowElement) {
      next.focus();
      select(next, false);
    }
  };
  switch (e.key) {
    case 'Enter':
    case ' ':
      e.preventDefault();
      select(tr, true);
      break;
    case 'ArrowDown':
      e.preventDefault();
      move(tr.nextElementSibling);
      break;
    case 'ArrowUp':
      e.preventDefault();
      move(tr.previousElementSibling);
      break;
    case 'Home':
      e.preventDefault();
      move(rowsEl.firstElementChild);
      break;
    case 'End':
      e.preventDefault();
      move(rowsEl.lastElementChild);
      break;
  }
});

for (const th of Array.from(document.querySelectorAll<HTMLTableCellElement>('th[data-col]'))) {
  th.querySelector('button')?.addEventListener('click', () => {
    const col = th.dataset.col as SortCol;
    if (state.sortCol === col) state.sortDir = state.sortDir === 'ascending' ? 'descending' : 'ascending';
    else {
      state.sortCol = col;
      state.sortDir = 'ascending';
    }
    vscode.setState(state);
    renderHeaders();
    renderRows();
    liveEl.textContent = `Sorted by ${th.textContent}, ${state.sortDir}`;
  });
}

window.addEventListener('message', (event: MessageEvent<ToPanel>) => {
  const msg = event.data;
  if (msg && msg.type === 'model') {
    const focusedKey = (document.activeElement as HTMLElement | null)
      ?.closest?.('tr')
      ?.getAttribute('data-key');
    model = msg.model;
    if (msg.select && model.rows.some((r) => r.key === msg.select)) {
      state.selected = msg.select;
      vscode.setState(state);
    }
    render();
    // Keep the keyboard where it was across live updates.
    if (focusedKey)
      rowsEl.querySelector<HTMLTableRowElement>(`tr[data-key="${CSS.escape(focusedKey)}"]`)?.focus();
  }
});

vscode.postMessage({ type: 'ready' });
