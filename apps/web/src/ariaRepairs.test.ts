import { afterEach, describe, expect, it } from 'vitest';
import { repairAria } from './ariaRepairs';
import { watchDom } from './watchDom';

// The markup ant-design-vue 4's Select renders while closed (seen in its Selector/Input).
const closedSelect = `<div class="ant-select" aria-label="Status"><input role="combobox" id="s" aria-owns="s_list"
  aria-controls="s_list" aria-activedescendant="s_list_0"></div>`;

afterEach(() => {
  document.body.innerHTML = '';
});

describe('repairAria', () => {
  it('gives a closed select a valid combobox: expanded false, no reference to a list not there, its label', () => {
    document.body.innerHTML = closedSelect;
    repairAria();
    const input = document.getElementById('s')!;
    expect(input.getAttribute('aria-expanded')).toBe('false');
    expect(input.hasAttribute('aria-owns')).toBe(false);
    expect(input.hasAttribute('aria-controls')).toBe(false);
    expect(input.hasAttribute('aria-activedescendant')).toBe(false);
    expect(input.getAttribute('aria-label')).toBe('Status');
  });

  it('puts the references back once the list is open', () => {
    document.body.innerHTML = closedSelect;
    repairAria();
    document.body.insertAdjacentHTML('beforeend', '<div id="s_list" role="listbox"><div id="s_list_0"></div></div>');
    repairAria();
    const input = document.getElementById('s')!;
    expect(input.getAttribute('aria-controls')).toBe('s_list');
    expect(input.getAttribute('aria-activedescendant')).toBe('s_list_0');
  });

  it('takes the name off an icon that is presentation only', () => {
    document.body.innerHTML = '<span role="presentation" aria-label="caret-up"></span>';
    repairAria();
    expect(document.querySelector('span')!.hasAttribute('aria-label')).toBe(false);
  });

  it('makes a menu’s divider a separator', () => {
    document.body.innerHTML =
      '<ul role="menu"><li role="menuitem">A</li><li class="ant-dropdown-menu-item-divider"></li></ul>';
    repairAria();
    expect(document.querySelector('li.ant-dropdown-menu-item-divider')!.getAttribute('role')).toBe('separator');
  });

  it('keeps repairing what renders later', async () => {
    const observer = watchDom([repairAria]);
    document.body.insertAdjacentHTML('beforeend', closedSelect);
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(document.getElementById('s')!.getAttribute('aria-expanded')).toBe('false');
    observer.disconnect();
  });
});
