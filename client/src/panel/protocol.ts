/** Messages between the summary panel's webview and the extension (both directions). */

export interface Cell {
  text: string;
  /** Sort key: a number (infinite life sorts last as +1e308), or null for an empty cell. */
  sort: number | null;
}

export interface PanelRow {
  /** Index of the check in the note (top to bottom). */
  index: number;
  /** Stable key for keeping the selection across edits: the id, or `#index`. */
  key: string;
  id: string;
  title: string;
  method: string;
  criterion: string;
  n_f: Cell;
  n_y: Cell;
  /** The first of the method's life names the check has (the server's `shown.life`), with its meaning. */
  life: Cell & { name: string; meaning: string };
  status: 'pass' | 'fail' | 'error' | 'unchecked';
  /** 1-based line of the block's opening fence, for screen readers and tooltips. */
  line: number;
}

export interface DerivationItem {
  name: string;
  display: string;
  meaning: string;
  origin: string;
  formula?: string;
  inputs?: string;
  source?: string;
  notes?: string[];
  assumption?: string;
  /** What the tool would have computed for a value the note states. */
  tool?: string;
}

export interface PanelDetail {
  key: string;
  heading: string;
  /** Method, criterion and the line of the block. */
  subtitle: string;
  /** Diagnostics of the check, counted (the editor and the Problems view show them). */
  problems: { errors: number; warnings: number };
  requirements: Array<{ text: string; actual: string; met: boolean | null }>;
  diagrams: Array<{ kind: string; title: string; svg: string }>;
  derivation: DerivationItem[];
  tables: Array<{ title: string; columns: string[]; rows: string[][] }>;
}

export interface PanelModel {
  state: 'note' | 'no-note' | 'no-checks' | 'error';
  fileName?: string;
  message?: string;
  rows: PanelRow[];
  details: PanelDetail[];
}

/** The model to show; `select` is the key of a row to select (the lens above a block was clicked). */
export type ToPanel = { type: 'model'; model: PanelModel; select?: string };

export type FromPanel =
  | { type: 'ready' }
  | { type: 'reveal'; index: number; key: string }
  | { type: 'select'; index: number; key: string };

export const CAUTION =
  'fatigue-notes assists a qualified engineer; it does not replace one. Every result depends on the inputs stated in the note and on the published methods named in its derivation. Local codes, standards and licensed engineering practice govern. Fatigue failures can kill: have the note checked and signed.';
