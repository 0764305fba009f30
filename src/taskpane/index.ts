/**
 * Task pane script (bundled as taskpane.js). The pane hosts the shared
 * runtime and says where it runs: inside Excel it reports how many DRIFT
 * functions the functions bundle bound, follows the Office theme and mounts
 * the tools (sweep builder, certificate check, function reference) on the
 * Excel workbook port; anywhere else the page keeps its "outside Excel" text,
 * with the reason added, and shows no tools (they need a workbook).
 */
import { readStatus } from '../excel/status';
import { createExcelPort } from './excelPort';
import { applyTheme } from './shell/theme';
import { mountTools } from './shell/start';
import { PANE_TOOLS } from './shell/toolList';

/** Where the page finds itself. */
export type PaneSituation =
  | { readonly kind: 'no-office' }
  | { readonly kind: 'not-excel'; readonly host: string | null }
  | { readonly kind: 'excel'; readonly boundCount: number };

/**
 * The status line for a situation.
 *
 * @param situation - what the page detected
 * @returns the text for the status element
 */
export function statusText(situation: PaneSituation): string {
  switch (situation.kind) {
    case 'no-office':
      return (
        'Office.js is not available here, so this page is not running inside Excel. Open Excel and ' +
        'sideload manifest/manifest.xml to use the DRIFT functions.'
      );
    case 'not-excel':
      return situation.host === null
        ? 'Opened outside Excel: Office.js loaded but found no Office application. Sideload ' +
            'manifest/manifest.xml into Excel to use the DRIFT functions.'
        : `Opened in ${situation.host}, not Excel: the DRIFT functions work only in Excel.`;
    case 'excel':
      return situation.boundCount > 0
        ? `Running in Excel: ${situation.boundCount} DRIFT functions are available in this workbook.`
        : 'Running in Excel, but the DRIFT functions were not bound; reload the add-in (see the browser console for the reason).';
  }
}

function show(situation: PaneSituation, doc: Document): void {
  const status = doc.getElementById('status');
  if (status === null) return;
  status.textContent = statusText(situation);
  status.classList.toggle('in-excel', situation.kind === 'excel');
}

/** Detects where the page runs and fills the status line. */
export function startPane(doc: Document = document): void {
  const office = (globalThis as { Office?: typeof Office }).Office;
  if (office === undefined || typeof office.onReady !== 'function') {
    show({ kind: 'no-office' }, doc);
    return;
  }
  void office.onReady((info) => {
    if (info.host === office.HostType.Excel) {
      show({ kind: 'excel', boundCount: readStatus()?.boundIds.length ?? 0 }, doc);
      if (doc.documentElement !== undefined) applyTheme(doc, office.context?.officeTheme?.bodyBackgroundColor);
      mountTools(doc, createExcelPort(), PANE_TOOLS);
    } else {
      show({ kind: 'not-excel', host: info.host === null || info.host === undefined ? null : String(info.host) }, doc);
    }
  });
}

if (typeof document !== 'undefined') startPane();
