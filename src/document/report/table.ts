// An HTML table from plain cells: every text escaped here, numbers right-aligned
// with their full value in data-value (so a reader or a test can check a shown
// number against the unrounded one).
import { escapeMarkup } from './escape';

export interface Cell {
  /** The text shown (escaped when written). */
  text: string;
  /** The unrounded number behind the text, written as data-value. */
  value?: number;
  /** A row header (the surface name). */
  header?: boolean;
  /** Hover text. */
  title?: string;
  /** Long text that may wrap (other cells stay on one line). */
  wrap?: boolean;
}

export const text = (t: string): Cell => ({ text: t });
export const num = (t: string, value: number): Cell => ({ text: t, value });
export const rowHead = (t: string): Cell => ({ text: t, header: true });

export interface TableSpec {
  /** data-table name, for readers and tests. */
  name: string;
  caption?: string;
  head: ReadonlyArray<Cell>;
  rows: ReadonlyArray<ReadonlyArray<Cell>>;
  /** Extra class, e.g. "matrix". */
  className?: string;
  /** data-surface of each row (surface names). */
  rowKeys?: ReadonlyArray<string>;
}

/** Names longer than this may wrap in a row header; shorter ones stay on one line (fewer, shorter rows in print). */
const SHORT_NAME = 18;

function cell(c: Cell, tag: 'th' | 'td', scope?: string): string {
  const attrs: string[] = [];
  if (scope === 'row' && c.text.length <= SHORT_NAME) attrs.push('class="nowrap"');
  if (scope) attrs.push(`scope="${scope}"`);
  if (c.value !== undefined) attrs.push(`class="num" data-value="${String(c.value)}"`);
  else if (c.wrap) attrs.push('class="wrap"');
  if (c.title) attrs.push(`title="${escapeMarkup(c.title)}"`);
  return `<${tag}${attrs.length ? ` ${attrs.join(' ')}` : ''}>${escapeMarkup(c.text)}</${tag}>`;
}

export function htmlTable(spec: TableSpec): string {
  const head = `<thead><tr>${spec.head.map((c) => cell(c, 'th', 'col')).join('')}</tr></thead>`;
  const rows = spec.rows.map((row, r) => {
    const key = spec.rowKeys?.[r];
    const open = key === undefined ? '<tr>' : `<tr data-surface="${escapeMarkup(key)}">`;
    return `${open}${row.map((c) => (c.header ? cell(c, 'th', 'row') : cell(c, 'td'))).join('')}</tr>`;
  });
  // Many columns: smaller type in print, so the table keeps to the page's width.
  const wide = spec.head.length > 16 ? 'wide wider' : spec.head.length > 10 ? 'wide' : '';
  const cls = ['data', spec.className, wide].filter(Boolean).join(' ');
  const caption = spec.caption ? `<caption>${escapeMarkup(spec.caption)}</caption>` : '';
  return `<table class="${cls}" data-table="${escapeMarkup(spec.name)}">${caption}${head}<tbody>${rows.join('')}</tbody></table>`;
}
