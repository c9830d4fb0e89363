/**
 * Gives each cell of an ant-design table the title of its column as `data-label`, so that on a
 * phone (styles.css) a row can be shown as a stacked list of the same fields, each named.
 */
export function labelTableCells(root: ParentNode = document) {
  root.querySelectorAll<HTMLTableElement>('.ant-table-wrapper table').forEach((table) => {
    const titles = [...table.querySelectorAll('thead > tr:last-child > th')].map((th) =>
      (th.querySelector('.ant-table-column-title') ?? th).textContent!.trim(),
    );
    if (!titles.length) return;
    table.querySelectorAll('tbody > tr').forEach((row) => {
      [...row.children].forEach((cell, i) => {
        const title = titles[i];
        if (title && cell.getAttribute('data-label') !== title) cell.setAttribute('data-label', title);
      });
    });
  });
}
