/**
 * Test-only code stays out of the add-in: the production task pane bundle
 * (dist/addin/taskpane.js) holds neither HyperFormula (the engine port) nor
 * the harness, and the add-in page links the pane's stylesheets.
 *
 * Needs `npm run build` first (npm test runs it).
 */
import { readFileSync } from 'fs';
import path from 'path';
import { ADDIN_DIR, requireAddinBuild } from '../excel/support/build';

describe('the production task pane bundle', () => {
  beforeAll(() => requireAddinBuild());

  it('contains no HyperFormula and no test harness', () => {
    const bundle = readFileSync(path.join(ADDIN_DIR, 'taskpane.js'), 'utf8');
    expect(bundle).not.toMatch(/hyperformula/i);
    expect(bundle).not.toMatch(/driftcellHarness|data-harness-ready/);
    // The tools are there: the sweep builder's insert button text.
    expect(bundle).toContain('Insert table and chart');
  });

  it('taskpane.html links taskpane.css and tools.css, both built', () => {
    const html = readFileSync(path.join(ADDIN_DIR, 'taskpane.html'), 'utf8');
    expect(html).toMatch(/<link rel="stylesheet" href="taskpane.css">/);
    expect(html).toMatch(/<link rel="stylesheet" href="tools.css">/);
    expect(readFileSync(path.join(ADDIN_DIR, 'tools.css'), 'utf8').length).toBeGreaterThan(0);
  });
});
