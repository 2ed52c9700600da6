/**
 * Writes each header cell's text onto the body cells of its column as `data-label`, which the
 * phone layout shows before the value. Column spans are followed, so a header over two columns
 * names both. Cells under an empty header (actions) get no label.
 */
export function copyHeaderLabels(root: HTMLElement) {
  for (const table of root.querySelectorAll('table')) {
    const headRow = table.tHead?.rows[table.tHead.rows.length - 1];
    if (!headRow) continue;
    const labels: string[] = [];
    for (const th of headRow.cells) {
      const text = (th.getAttribute('aria-label') ?? th.textContent ?? '').trim();
      for (let i = 0; i < th.colSpan; i++) labels.push(text);
    }
    for (const body of table.tBodies) {
      for (const row of body.rows) {
        let col = 0;
        for (const cell of row.cells) {
          const label = cell.colSpan > 1 ? '' : (labels[col] ?? '');
          if (label) {
            if (cell.getAttribute('data-label') !== label) cell.setAttribute('data-label', label);
          } else if (cell.hasAttribute('data-label')) cell.removeAttribute('data-label');
          col += cell.colSpan;
        }
      }
    }
  }
}
