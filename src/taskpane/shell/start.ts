/**
 * Fills an opened pane page: theme, tabs and tools bound to a workbook port.
 * Shared by the Excel pane (index.ts) and the test harness, so both show
 * the same pane.
 */
import type { WorkbookPort } from '../port';
import type { PaneTool } from '../tool';
import { mountShell, type MountedShell } from './shell';

/**
 * Mounts the tools into the page's #tools element with #messages as live
 * region, and shows them.
 *
 * @param doc - the pane page (needs #tools and #messages)
 * @param port - the workbook
 * @param tools - tools in tab order
 * @returns the shell, or null when the page lacks the elements
 */
export function mountTools(doc: Document, port: WorkbookPort, tools: readonly PaneTool[]): MountedShell | null {
  const container = doc.getElementById('tools');
  const messages = doc.getElementById('messages');
  if (container === null || messages === null) return null;
  container.hidden = false;
  return mountShell(container, port, tools, messages);
}
