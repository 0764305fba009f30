/** The task pane's status line, inside and outside Excel (Office.js stood in for). */
import { publishStatus } from '../../src/excel/status';
import { startPane, statusText } from '../../src/taskpane';

function fakeDocument() {
  const classes = new Set<string>();
  const status = {
    textContent: '',
    classList: { toggle: (name: string, on: boolean) => void (on ? classes.add(name) : classes.delete(name)) },
  };
  return { doc: { getElementById: (id: string) => (id === 'status' ? status : null) } as unknown as Document, status, classes };
}

const globals = globalThis as { Office?: unknown };
afterEach(() => delete globals.Office);

describe('statusText', () => {
  it('says plainly when the page is not inside Excel', () => {
    expect(statusText({ kind: 'no-office' })).toMatch(/not running inside Excel/);
    expect(statusText({ kind: 'not-excel', host: null })).toMatch(/Opened outside Excel/);
    expect(statusText({ kind: 'not-excel', host: 'Word' })).toMatch(/Opened in Word, not Excel/);
  });

  it('counts the bound functions inside Excel, and says when none were bound', () => {
    expect(statusText({ kind: 'excel', boundCount: 19 })).toBe('Running in Excel: 19 DRIFT functions are available in this workbook.');
    expect(statusText({ kind: 'excel', boundCount: 0 })).toMatch(/were not bound/);
  });
});

describe('startPane', () => {
  it('reports a missing Office.js', () => {
    const { doc, status } = fakeDocument();
    startPane(doc);
    expect(status.textContent).toMatch(/Office\.js is not available/);
  });

  it('reports Excel and the functions the functions bundle bound', async () => {
    publishStatus(['BANDGAP', 'INTRINSIC']);
    const { doc, status, classes } = fakeDocument();
    let ready: Promise<void> = Promise.resolve();
    globals.Office = {
      HostType: { Excel: 'Excel' },
      onReady: (callback: (info: { host: string | null }) => void) => (ready = Promise.resolve().then(() => callback({ host: 'Excel' }))),
    };
    startPane(doc);
    await ready;
    expect(status.textContent).toBe('Running in Excel: 2 DRIFT functions are available in this workbook.');
    expect(classes.has('in-excel')).toBe(true);
  });

  it('reports a browser page where Office.js found no host', async () => {
    const { doc, status } = fakeDocument();
    let ready: Promise<void> = Promise.resolve();
    globals.Office = {
      HostType: { Excel: 'Excel' },
      onReady: (callback: (info: { host: string | null }) => void) => (ready = Promise.resolve().then(() => callback({ host: null }))),
    };
    startPane(doc);
    await ready;
    expect(status.textContent).toMatch(/Opened outside Excel/);
  });
});
