/**
 * Repairs to the ARIA that ant-design-vue 4 renders and cannot be configured away:
 * - its Select's combobox input leaves out `aria-expanded` while closed, and points
 *   `aria-owns`, `aria-controls` and `aria-activedescendant` at a list that exists only while
 *   open. The references are kept while their target exists and put back when it appears;
 * - an `aria-label` given to a Select lands on its wrapper, not on the combobox that needs it;
 * - a menu's divider is a list item with no role inside a `role="menu"` list: it is a separator;
 * - icons inside its table sorter are `role="presentation"` yet keep an `aria-label`.
 * `watchDom` applies them to whatever the components render, whenever they render it.
 */
const REFERENCES = ['aria-owns', 'aria-controls', 'aria-activedescendant'] as const;
const kept = new WeakMap<Element, Partial<Record<(typeof REFERENCES)[number], string>>>();

function repairCombobox(input: Element) {
  const wanted = kept.get(input) ?? {};
  for (const attribute of REFERENCES) {
    const current = input.getAttribute(attribute);
    if (current) wanted[attribute] = current; // the component's own latest value
    const target = wanted[attribute];
    if (!target) continue;
    if (document.getElementById(target)) {
      if (current !== target) input.setAttribute(attribute, target);
    } else if (current !== null) input.removeAttribute(attribute);
  }
  kept.set(input, wanted);
  if (!input.hasAttribute('aria-expanded')) input.setAttribute('aria-expanded', 'false');
  const label = input.closest('.ant-select[aria-label]')?.getAttribute('aria-label');
  if (label && input.getAttribute('aria-label') !== label) input.setAttribute('aria-label', label);
}

export function repairAria(root: ParentNode = document) {
  root.querySelectorAll('input[role="combobox"]').forEach(repairCombobox);
  root.querySelectorAll('[role="presentation"][aria-label]').forEach((el) => el.removeAttribute('aria-label'));
  root
    .querySelectorAll('[role="menu"] > li[class*="menu-item-divider"]:not([role])')
    .forEach((el) => el.setAttribute('role', 'separator'));
}
