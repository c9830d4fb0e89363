import { afterEach, describe, expect, it } from 'vitest';
import { labelTableCells } from './tableLabels';

afterEach(() => {
  document.body.innerHTML = '';
});

describe('labelTableCells', () => {
  it('names each cell by the title of its column, sorter titles included', () => {
    document.body.innerHTML = `<div class="ant-table-wrapper"><table>
      <thead><tr><th><span class="ant-table-column-title">Request</span><span>▲▼</span></th><th>Status</th><th></th></tr></thead>
      <tbody><tr><td>Carton</td><td>Open</td><td><button>Open it</button></td></tr></tbody></table></div>`;
    labelTableCells();
    const cells = [...document.querySelectorAll('tbody td')].map((td) => td.getAttribute('data-label'));
    expect(cells).toEqual(['Request', 'Status', null]);
  });
});
