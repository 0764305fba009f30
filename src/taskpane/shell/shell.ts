/**
 * The pane shell: one tab per tool (keyboard: arrow keys, Home, End move
 * between tabs; Tab enters the panel), a panel per tool mounted once, and a
 * live region through which tools announce what happened.
 */
import type { WorkbookPort } from '../port';
import type { MessageTone, PaneTool, ToolContext } from '../tool';

/** The mounted shell. */
export interface MountedShell {
  /** Shows the tool with this id, as a click on its tab would. */
  select(id: string): void;
  readonly context: ToolContext;
}

/**
 * Builds the tabs and panels inside `container` and mounts every tool.
 *
 * @param container - the element that receives the tab list and panels (e.g. #tools)
 * @param port - the workbook the tools write to
 * @param tools - tools in tab order
 * @param messages - the live region (role=status, aria-live=polite) for announcements
 * @returns the shell, with the first tool shown
 */
export function mountShell(container: HTMLElement, port: WorkbookPort, tools: readonly PaneTool[], messages: HTMLElement): MountedShell {
  const doc = container.ownerDocument;
  const context: ToolContext = {
    port,
    doc,
    announce(message: string, tone: MessageTone = 'info') {
      messages.className = `messages tone-${tone}`;
      // Cleared first so a repeated message is read out again.
      messages.textContent = '';
      const text = doc.createElement('p');
      text.textContent = message;
      messages.append(text);
    },
  };
  const tabList = doc.createElement('div');
  tabList.className = 'tabs';
  tabList.setAttribute('role', 'tablist');
  tabList.setAttribute('aria-label', 'Tools');
  container.append(tabList);

  const tabs: HTMLButtonElement[] = [];
  const panels: HTMLElement[] = [];
  for (const tool of tools) {
    const tab = doc.createElement('button');
    tab.type = 'button';
    tab.id = `tab-${tool.id}`;
    tab.className = 'tab';
    tab.textContent = tool.label;
    tab.setAttribute('role', 'tab');
    tab.setAttribute('aria-controls', `panel-${tool.id}`);
    tabList.append(tab);
    const panel = doc.createElement('section');
    panel.id = `panel-${tool.id}`;
    panel.className = 'panel dc-tool';
    panel.setAttribute('role', 'tabpanel');
    panel.setAttribute('aria-labelledby', tab.id);
    container.append(panel);
    tabs.push(tab);
    panels.push(panel);
    tool.mount(panel, context);
  }

  function show(index: number, focus: boolean): void {
    tabs.forEach((tab, i) => {
      const on = i === index;
      tab.setAttribute('aria-selected', String(on));
      tab.tabIndex = on ? 0 : -1;
      panels[i].hidden = !on;
    });
    if (focus) tabs[index].focus();
  }

  tabs.forEach((tab, index) => {
    tab.addEventListener('click', () => show(index, false));
    tab.addEventListener('keydown', (event) => {
      const last = tabs.length - 1;
      const target = {
        ArrowRight: index === last ? 0 : index + 1,
        ArrowLeft: index === 0 ? last : index - 1,
        Home: 0,
        End: last,
      }[event.key];
      if (target === undefined) return;
      event.preventDefault();
      show(target, true);
    });
  });
  if (tabs.length > 0) show(0, false);

  return {
    context,
    select(id) {
      const index = tools.findIndex((tool) => tool.id === id);
      if (index < 0) throw new RangeError(`no tool '${id}'; tools are ${tools.map((t) => t.id).join(', ')}`);
      show(index, false);
    },
  };
}
