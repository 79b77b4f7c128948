/**
 * The report's only script: sort the summary table when a header button is clicked (numbers by
 * their data-sort value, text otherwise; click again to reverse). Without JavaScript the table
 * stays in the markup's order, by status. No network, no eval, no data from the page's text
 * reaches innerHTML: rows are moved, never rebuilt.
 */
export const HTML_SCRIPT = `
(function () {
  var table = document.getElementById('summary');
  if (!table || !table.tBodies[0]) return;
  var body = table.tBodies[0];
  var heads = table.tHead.rows[0].cells;
  function key(row, col) {
    var cell = row.cells[col];
    var v = cell.getAttribute('data-sort');
    if (v === null) return cell.textContent.trim().toLowerCase();
    var n = parseFloat(v);
    return isNaN(n) ? v : n;
  }
  Array.prototype.forEach.call(heads, function (th, col) {
    var button = th.querySelector('button');
    if (!button) return;
    button.addEventListener('click', function () {
      var dir = th.getAttribute('aria-sort') === 'ascending' ? -1 : 1;
      Array.prototype.forEach.call(heads, function (h) { h.removeAttribute('aria-sort'); });
      th.setAttribute('aria-sort', dir === 1 ? 'ascending' : 'descending');
      var rows = Array.prototype.slice.call(body.rows);
      rows.sort(function (a, b) {
        var x = key(a, col), y = key(b, col);
        var xm = x === '' || x === 'n/a', ym = y === '' || y === 'n/a';
        if (xm !== ym) return xm ? 1 : -1;
        if (typeof x === 'number' && typeof y === 'number') return (x - y) * dir;
        return String(x).localeCompare(String(y)) * dir;
      });
      rows.forEach(function (r) { body.appendChild(r); });
    });
  });
})();
`;
