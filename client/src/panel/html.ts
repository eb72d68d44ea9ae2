/**
 * The summary panel's HTML document: a strict content security policy (scripts and styles
 * only with this page's nonce or from the extension), the diagrams' stylesheet, and the
 * webview script that renders the table and details from the extension's messages.
 */
import { CAUTION } from './protocol';

/**
 * The diagrams' stylesheet in `dist/`: the core's `DIAGRAM_STYLE`, written there by the build
 * (scripts/build.mjs), so that the extension carries the style and not the core.
 */
export const DIAGRAM_STYLE_FILE = 'diagrams.css';

export interface PanelPage {
  /** `webview.cspSource`: the origin of the extension's resources inside the webview. */
  cspSource: string;
  nonce: string;
  scriptUri: string;
  styleUri: string;
  /** The diagrams' stylesheet (`dist/diagrams.css`). */
  diagramStyleUri: string;
}

export function panelHtml(p: PanelPage): string {
  const csp = [
    "default-src 'none'",
    `img-src ${p.cspSource} data:`,
    `style-src ${p.cspSource} 'nonce-${p.nonce}'`,
    `font-src ${p.cspSource}`,
    `script-src 'nonce-${p.nonce}'`,
  ].join('; ');
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="UTF-8">
<meta http-equiv="Content-Security-Policy" content="${csp}">
<meta name="viewport" content="width=device-width, initial-scale=1.0">
<title>fatigue-notes: checks of this note</title>
<link rel="stylesheet" href="${p.styleUri}" nonce="${p.nonce}">
<link rel="stylesheet" href="${p.diagramStyleUri}" nonce="${p.nonce}">
</head>
<body>
<header class="bar">
  <h1 id="heading">Checks</h1>
  <span id="note" class="note"></span>
</header>
<main>
  <p id="live" class="visually-hidden" role="status" aria-live="polite"></p>
  <section id="empty" class="empty" hidden></section>
  <section id="results" hidden>
    <div class="table-wrap">
      <table id="checks" aria-describedby="table-help">
        <caption id="table-help">Every check of the note. Choose a column heading to sort; Enter or a click on a row shows its block in the editor; arrow keys move between rows.</caption>
        <thead><tr>
          <th scope="col" data-col="id" aria-sort="none"><button type="button">Id</button></th>
          <th scope="col" data-col="title" aria-sort="none"><button type="button">Title</button></th>
          <th scope="col" data-col="method" aria-sort="none"><button type="button">Method</button></th>
          <th scope="col" data-col="criterion" aria-sort="none"><button type="button">Criterion</button></th>
          <th scope="col" data-col="n_f" class="num" aria-sort="none"><button type="button" title="n_f: fatigue safety factor (chosen criterion and load line)">n<sub>f</sub> fatigue</button></th>
          <th scope="col" data-col="n_y" class="num" aria-sort="none"><button type="button" title="n_y: first-cycle yield safety factor (Langer)">n<sub>y</sub> yield</button></th>
          <th scope="col" data-col="life" class="num" aria-sort="none"><button type="button" title="the life or damage result the check's method names: N_f cycles to failure, D_sum Miner damage of one pass, N_cg crack-growth cycles ...">Life or damage</button></th>
          <th scope="col" data-col="status" aria-sort="none"><button type="button">Status</button></th>
        </tr></thead>
        <tbody id="rows"></tbody>
      </table>
    </div>
    <section id="detail" class="detail" aria-labelledby="detail-heading"></section>
  </section>
</main>
<footer class="caution"><p>${CAUTION}</p></footer>
<script nonce="${p.nonce}" src="${p.scriptUri}"></script>
</body>
</html>`;
}

/** A fresh nonce for each page (Web Crypto, available in Node 20 and in browsers). */
export function makeNonce(): string {
  const chars = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';
  const bytes = globalThis.crypto.getRandomValues(new Uint8Array(32));
  return Array.from(bytes, (b) => chars[b % chars.length]).join('');
}
