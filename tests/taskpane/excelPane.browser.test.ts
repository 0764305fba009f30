/**
 * The production pane (dist/addin/taskpane.html and its bundles) in Debian's
 * Chromium with a stand-in for Office.js served in its place: Office reports
 * the Excel host and a dark Office theme, and a small in-page Excel object
 * model records what the Excel adapter asks for. Checks that the pane mounts
 * its three tools only inside Excel, follows the Office theme, and that the
 * Sweep builder's insert reaches the workbook through Excel.run with one
 * spilled formula, number formats and an XY chart with log axes.
 *
 * Needs `npm run build` first (npm test runs it). Never downloads a browser.
 */
import type { Page } from 'playwright-core';
import { startServer, staticRequestHandler, type RunningServer } from '../../dev/devServer';
import { ADDIN_DIR, requireAddinBuild } from '../excel/support/build';
import { launchLocalBrowser, type LocalBrowser } from '../excel/support/localBrowser';

const OFFICE_JS = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';

/** The stand-in, as page script: Office (host Excel, dark theme) and an Excel object model that records calls. */
const STAND_IN = `
(function () {
  var log = { formulas: {}, numberFormats: [], charts: [], bold: [] };
  window.__excelLog = log;
  function size(address) {
    var parts = address.split(':');
    function rc(a) { var m = /^([A-Z]+)(\\d+)$/.exec(a); var c = 0; for (var i = 0; i < m[1].length; i++) c = c * 26 + m[1].charCodeAt(i) - 64; return [Number(m[2]) - 1, c - 1]; }
    var a = rc(parts[0]); var b = rc(parts[1] || parts[0]);
    return { rows: b[0] - a[0] + 1, columns: b[1] - a[1] + 1 };
  }
  function grid(address, value) { var s = size(address); var g = []; for (var r = 0; r < s.rows; r++) { var row = []; for (var c = 0; c < s.columns; c++) row.push(value); g.push(row); } return g; }
  function range(address) {
    var self = { address: address, values: grid(address, ''), valueTypes: grid(address, 'Empty'), format: { font: {} }, load: function () { return self; } };
    self.formulas = grid(address, '');
    Object.defineProperty(self, 'formulas', { get: function () { return grid(address, ''); }, set: function (v) { log.formulas[address] = v; } });
    Object.defineProperty(self, 'numberFormat', { set: function (v) { log.numberFormats.push([address, v[0][0]]); } });
    Object.defineProperty(self.format.font, 'bold', { set: function (v) { if (v) log.bold.push(address); } });
    return self;
  }
  function axis() { return { title: {}, scaleType: 'Linear' }; }
  var sheet = {
    name: 'Sheet1',
    load: function () {},
    getRange: range,
    charts: { add: function (type, source, by) {
      var series = [];
      function makeSeries(name) { var s = { name: name, setXAxisValues: function (r) { s.x = r.address; }, setValues: function (r) { s.y = r.address; } }; series.push(s); return s; }
      makeSeries('');
      var chart = { type: type, by: by, title: {}, axes: { categoryAxis: axis(), valueAxis: axis() }, series: { getItemAt: function (i) { return series[i]; }, add: makeSeries }, setPosition: function (a) { chart.position = a; }, list: series };
      log.charts.push(chart);
      return chart;
    } },
  };
  var context = {
    workbook: {
      worksheets: { getItem: function () { return sheet; } },
      getSelectedRange: function () { return { rowIndex: 1, columnIndex: 1, rowCount: 1, columnCount: 1, worksheet: sheet, load: function () {} }; },
    },
    sync: function () { return Promise.resolve(); },
  };
  window.Excel = { run: function (batch) { return batch(context); } };
  window.Office = {
    HostType: { Excel: 'Excel' },
    context: { officeTheme: { bodyBackgroundColor: '#262626' } },
    onReady: function (callback) { var info = { host: 'Excel' }; return Promise.resolve().then(function () { callback(info); return info; }); },
  };
})();
`;

describe('the production pane inside (a stand-in for) Excel', () => {
  let server: RunningServer;
  let browser: LocalBrowser;
  let page: Page;

  beforeAll(async () => {
    requireAddinBuild();
    server = await startServer(staticRequestHandler(ADDIN_DIR), { port: 0, host: '127.0.0.1' });
    browser = await launchLocalBrowser(server.url);
    page = await browser.context.newPage();
    await page.setViewportSize({ width: 350, height: 900 });
    // Page routes come before the context's block-everything-else route.
    await page.route(OFFICE_JS, (route) => route.fulfill({ status: 200, contentType: 'text/javascript', body: STAND_IN }));
    await page.goto(`${server.url}/taskpane.html`, { waitUntil: 'load' });
    await page.waitForSelector('[role=tab]');
  });

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('mounts the three tools, says it runs in Excel, and follows the dark Office theme', async () => {
    expect(await page.getByRole('tab').allTextContents()).toEqual(['Sweep builder', 'Certificate check', 'Function reference']);
    expect(await page.locator('#status').textContent()).toMatch(/^Running in Excel/); // (no CustomFunctions runtime in the stand-in, so none are bound)
    expect(await page.evaluate(() => document.documentElement.getAttribute('data-theme'))).toBe('dark');
    // Nothing but the pane's own files and the (stood-in) Office.js was requested.
    expect(browser.blocked).toEqual([]);
  });

  it('outside Excel (Office.js unavailable) shows the reason and no tools', async () => {
    const outside = await browser.context.newPage();
    await outside.goto(`${server.url}/taskpane.html`, { waitUntil: 'load' });
    expect(await outside.locator('#status').textContent()).toMatch(
      /Office\.js is not available here, so this page is not running inside Excel/,
    );
    expect(await outside.locator('#tools').isHidden()).toBe(true);
    expect(await outside.getByRole('tab').count()).toBe(0);
    await outside.close();
  });

  it('inserts a sweep through Excel.run: one anchor formula, formats, an XY chart with log axes', async () => {
    await page.getByLabel('dopant').selectOption('B');
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    await page.waitForFunction(() => /Inserted|Not inserted|Nothing written/.test(document.getElementById('messages')?.textContent ?? ''));
    expect(await page.locator('#messages').textContent()).toMatch(/^Inserted at Sheet1!B2:C34/);
    const log = await page.evaluate(() => {
      const l = (
        window as unknown as {
          __excelLog: {
            formulas: Record<string, unknown[][]>;
            numberFormats: string[][];
            bold: string[];
            charts: {
              type: string;
              by: string;
              title: { text: string };
              axes: { categoryAxis: { scaleType: string }; valueAxis: { scaleType: string } };
              position: string;
              list: { name: string; x: string; y: string }[];
            }[];
          };
        }
      ).__excelLog;
      return JSON.parse(
        JSON.stringify({
          ...l,
          charts: l.charts.map((c) => ({
            type: c.type,
            by: c.by,
            title: c.title.text,
            x: c.axes.categoryAxis.scaleType,
            y: c.axes.valueAxis.scaleType,
            position: c.position,
            series: c.list.map((s) => ({ name: s.name, x: s.x, y: s.y })),
          })),
        }),
      );
    });
    expect(log.formulas['C4']).toEqual([['=DRIFT.RESISTIVITY(B4:B34,"B",300)']]);
    expect(log.formulas['B2:C3'][1]).toEqual(['Doping (cm⁻³)', 'Resistivity ρ (Ω·cm)']);
    expect(log.formulas['B4:B34']).toHaveLength(31);
    expect(log.numberFormats).toEqual(
      expect.arrayContaining([
        ['B4:B34', '0.00E+00'],
        ['C4:C34', '0.000E+00'],
      ]),
    );
    expect(log.charts).toEqual([
      {
        type: 'XYScatterLines',
        by: 'Columns',
        title: 'Resistivity ρ (Ω·cm)',
        x: 'Logarithmic',
        y: 'Logarithmic',
        position: 'E2',
        series: [{ name: 'Resistivity ρ', x: 'B4:B34', y: 'C4:C34' }],
      },
    ]);
  });
});
