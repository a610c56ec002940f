// Colours, type and the shared bits of style of every panel. Our own palette: warm paper, dark ink, one
// deep green accent; verdicts and statuses always pair a colour with a glyph or shape (greyscale-safe).
import { css } from 'lit';

export const theme = css`
  :host {
    --paper: #fbf8f1;
    --panel: #f3efe4;
    --rule: #d9d2c0;
    --ink: #1e1c18;
    --ink-soft: #5c574c;
    --accent: #0f6b5c;
    --accent-soft: #d6ebe5;
    --holds: #1d6b35;
    --fails: #a33a1f;
    --undecided: #6b5d2f;
    --focus: #e3a21a;
    font-family: 'DejaVu Sans', 'Segoe UI', system-ui, sans-serif;
    font-size: 13px;
    color: var(--ink);
  }
  button {
    font: inherit;
    color: var(--ink);
    background: var(--paper);
    border: 1px solid var(--rule);
    border-radius: 4px;
    padding: 3px 8px;
    cursor: pointer;
  }
  button:hover { border-color: var(--ink-soft); }
  button:disabled { opacity: 0.45; cursor: default; }
  button:focus-visible, input:focus-visible, select:focus-visible, summary:focus-visible, [tabindex]:focus-visible {
    outline: 3px solid var(--focus);
    outline-offset: 1px;
  }
  input, select {
    font: inherit;
    border: 1px solid var(--rule);
    border-radius: 4px;
    padding: 3px 6px;
    background: #fff;
    color: var(--ink);
  }
  .mono { font-family: 'DejaVu Sans Mono', ui-monospace, monospace; font-size: 12px; overflow-wrap: anywhere; }
  .soft { color: var(--ink-soft); }
  .status-exact::before { content: '●'; margin-right: 3px; }
  .status-algebraic::before { content: '○'; margin-right: 3px; }
  .status-approximate::before { content: '◌'; margin-right: 3px; }
  .status-failed::before { content: '⊘'; margin-right: 3px; }
  .verdict-holds { color: var(--holds); font-weight: 600; }
  .verdict-holds::before { content: '✓ '; }
  .verdict-fails { color: var(--fails); font-weight: 600; }
  .verdict-fails::before { content: '✗ '; }
  .verdict-undecided { color: var(--undecided); font-weight: 600; }
  .verdict-undecided::before { content: '? '; }
`;
