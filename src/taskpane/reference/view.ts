/**
 * The Function reference's controls: a search box, a listbox of matching
 * catalog entries (arrow keys, Home/End; selection follows the active
 * option), the chosen entry's details, and "Insert at the active cell".
 * Search, details and insertion live in search.ts, details.ts and insert.ts.
 */
import { CATALOG } from '../../catalog';
import type { FunctionSpec } from '../../catalog/types';
import { qualifiedName } from '../../catalog/naming';
import type { ToolContext } from '../tool';
import { element } from '../dom';
import { describeFunction } from './details';
import { insertFunction } from './insert';
import { searchCatalog } from './search';

const ID = 'reference';

function optionId(spec: FunctionSpec): string {
  return `${ID}-option-${spec.name.toLowerCase()}`;
}

/** The details panel's contents for one entry. */
function detailsContent(doc: Document, spec: FunctionSpec): Node[] {
  const details = describeFunction(spec);
  const parameterRows = details.parameters.map((parameter) =>
    element(doc, 'tr', {}, [
      element(doc, 'th', { scope: 'row' }, [element(doc, 'code', { text: parameter.name }), parameter.optional ? ' (optional)' : '']),
      element(doc, 'td', { text: parameter.unit ?? '—' }),
      element(doc, 'td', {
        text:
          parameter.description +
          (parameter.optional && parameter.defaultText !== null && !parameter.description.includes('blank means')
            ? ` Blank means ${parameter.defaultText}.`
            : ''),
      }),
    ]),
  );
  const nodes: Node[] = [
    element(doc, 'h3', { id: `${ID}-details-title`, text: details.qualifiedName }),
    element(doc, 'p', { text: details.summary }),
    element(doc, 'p', { class: 'dc-signature' }, [element(doc, 'code', { text: details.signature })]),
  ];
  if (parameterRows.length > 0) {
    nodes.push(
      element(doc, 'div', { class: 'dc-scroll' }, [
        element(doc, 'table', { class: 'dc-parameters' }, [
          element(doc, 'caption', { text: 'Arguments' }),
          element(doc, 'thead', {}, [
            element(doc, 'tr', {}, [
              element(doc, 'th', { scope: 'col', text: 'Name' }),
              element(doc, 'th', { scope: 'col', text: 'Unit' }),
              element(doc, 'th', { scope: 'col', text: 'Meaning' }),
            ]),
          ]),
          element(doc, 'tbody', {}, parameterRows),
        ]),
      ]),
    );
  }
  const resultText =
    `Result: ${details.result.description}${details.result.unit === null ? '' : `, in ${details.result.unit}`}` +
    (details.columns.length > 0 ? `; spills one row: ${details.columns.join(' | ')}.` : '.');
  nodes.push(element(doc, 'p', { class: 'dc-result', text: resultText }));
  if (details.models.length > 0) {
    nodes.push(
      element(doc, 'h4', { text: 'Models and sources' }),
      element(
        doc,
        'ul',
        { class: 'dc-models' },
        details.models.map((model) =>
          element(
            doc,
            'li',
            {},
            model.info === null
              ? [element(doc, 'code', { text: model.code }), ': no description registered.']
              : [
                  element(doc, 'strong', { text: model.info.name }),
                  ' ',
                  element(doc, 'code', { text: model.info.code }),
                  element(doc, 'br'),
                  model.info.citation,
                  element(doc, 'br'),
                  element(doc, 'span', { class: 'dc-validity', text: `Valid: ${model.info.validity}` }),
                ],
          ),
        ),
      ),
    );
  }
  if (details.examples.length > 0) {
    nodes.push(
      element(doc, 'h4', { text: 'Examples' }),
      element(
        doc,
        'ul',
        { class: 'dc-examples' },
        details.examples.map((example) => element(doc, 'li', {}, [element(doc, 'code', { text: example.formula }), ` — ${example.note}`])),
      ),
    );
  }
  nodes.push(
    element(doc, 'details', { class: 'dc-help' }, [
      element(doc, 'summary', { text: 'Full help' }),
      ...details.help.map((paragraph) => element(doc, 'p', { text: paragraph })),
    ]),
    element(doc, 'p', { class: 'dc-hint', text: 'Results are estimates from published models; mind the validity ranges above.' }),
  );
  return nodes;
}

/**
 * Builds the tool inside its panel.
 *
 * @param panel - the tool's panel element
 * @param context - port, document and announce from the shell
 */
export function mountFunctionReference(panel: HTMLElement, context: ToolContext): void {
  const { doc } = context;
  panel.classList.add('dc-tool');
  const search = element(doc, 'input', {
    type: 'search',
    id: `${ID}-search`,
    role: 'searchbox',
    autocomplete: 'off',
    spellcheck: 'false',
    'aria-controls': `${ID}-results`,
    placeholder: 'name, quantity, unit or model',
  });
  const count = element(doc, 'p', { id: `${ID}-count`, class: 'dc-hint', 'aria-live': 'polite' });
  const list = element(doc, 'ul', {
    id: `${ID}-results`,
    role: 'listbox',
    class: 'dc-listbox',
    tabindex: '0',
    'aria-label': 'Matching functions',
  });
  const detailsPanel = element(doc, 'section', { id: `${ID}-details`, class: 'dc-details', 'aria-labelledby': `${ID}-details-title` });
  const insertButton = element(doc, 'button', {
    type: 'button',
    id: `${ID}-insert`,
    class: 'dc-button dc-primary',
    text: 'Insert at the active cell',
  });

  let shown: FunctionSpec[] = [];
  let selected: FunctionSpec | null = null;

  function select(spec: FunctionSpec | null, scroll = true): void {
    selected = spec;
    for (const option of Array.from(list.children))
      option.setAttribute('aria-selected', String(option.id === (spec ? optionId(spec) : '')));
    if (spec === null) {
      list.removeAttribute('aria-activedescendant');
      detailsPanel.replaceChildren(
        element(doc, 'p', { class: 'dc-hint', text: 'No function matches; try a shorter word, a unit such as ohm cm, or a model name.' }),
      );
      insertButton.disabled = true;
      return;
    }
    list.setAttribute('aria-activedescendant', optionId(spec));
    detailsPanel.replaceChildren(...detailsContent(doc, spec));
    insertButton.disabled = false;
    insertButton.textContent = `Insert ${qualifiedName(spec)} at the active cell`;
    if (scroll) doc.getElementById(optionId(spec))?.scrollIntoView?.({ block: 'nearest' });
  }

  function render(): void {
    shown = searchCatalog(search.value).map((hit) => hit.spec);
    list.replaceChildren(
      ...shown.map((spec) => {
        const option = element(doc, 'li', { role: 'option', id: optionId(spec), 'aria-selected': 'false' }, [
          element(doc, 'span', { class: 'dc-option-name', text: qualifiedName(spec) }),
          element(doc, 'span', { class: 'dc-option-summary', text: spec.summary }),
        ]);
        option.addEventListener('click', () => {
          select(spec);
          list.focus();
        });
        return option;
      }),
    );
    count.textContent = search.value.trim() === '' ? `${shown.length} functions` : `${shown.length} of ${CATALOG.length} functions match`;
    select(shown.includes(selected as FunctionSpec) ? selected : (shown[0] ?? null), false);
  }

  function move(to: number): void {
    if (shown.length === 0) return;
    select(shown[Math.max(0, Math.min(shown.length - 1, to))]);
  }

  search.addEventListener('input', render);
  search.addEventListener('keydown', (event) => {
    if (event.key === 'ArrowDown' && shown.length > 0) {
      event.preventDefault();
      list.focus();
      if (selected === null) move(0);
    }
  });
  list.addEventListener('keydown', (event) => {
    const index = selected === null ? -1 : shown.indexOf(selected);
    const handled: Record<string, () => void> = {
      ArrowDown: () => move(index + 1),
      ArrowUp: () => (index <= 0 ? search.focus() : move(index - 1)),
      Home: () => move(0),
      End: () => move(shown.length - 1),
      Enter: () => insertButton.click(),
    };
    const action = handled[event.key];
    if (action !== undefined) {
      event.preventDefault();
      action();
    }
  });
  list.addEventListener('focus', () => {
    if (selected === null && shown.length > 0) move(0);
  });

  insertButton.addEventListener('click', () => {
    const spec = selected;
    if (spec === null) return;
    void (async () => {
      try {
        const plan = await insertFunction(context.port, spec);
        context.announce(plan.summary, plan.missing.length > 0 ? 'info' : 'success');
      } catch (error) {
        context.announce(error instanceof Error ? error.message : String(error), 'error');
      }
    })();
  });

  panel.append(
    element(doc, 'h2', { text: 'Function reference' }),
    element(doc, 'div', { class: 'dc-field' }, [element(doc, 'label', { for: search.id, text: 'Search functions' }), search]),
    count,
    list,
    insertButton,
    detailsPanel,
  );
  render();
}
