/**
 * What the pane shell gives each tool, and what a tool gives the shell. The
 * shell (index.ts) owns tabs, status and theme; each tool owns its own panel.
 */
import type { WorkbookPort } from './port';

/** How a tool tells the user what happened. */
export type MessageTone = 'info' | 'success' | 'error';

/** Services the shell hands to a tool when it mounts. */
export interface ToolContext {
  /** The workbook (Excel or the headless engine). */
  readonly port: WorkbookPort;
  /** The document the pane lives in. */
  readonly doc: Document;
  /** Shows a message in the pane's live region (read out by screen readers). */
  announce(message: string, tone?: MessageTone): void;
}

/** One tool of the pane: a tab and its panel. */
export interface PaneTool {
  /** Stable id, used for element ids: lowercase letters and dashes. */
  readonly id: string;
  /** Tab label shown to the user. */
  readonly label: string;
  /** Builds the tool's controls inside `panel` (called once). */
  mount(panel: HTMLElement, context: ToolContext): void;
}
