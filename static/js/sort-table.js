// Sorts a table.sortable by a column whose heading has data-key, reading each row's data-<key> number.
// Progressive: without JavaScript the rows stay in the server's order (best first).
(function () {
  'use strict';
  function attr(key) {
    return 'data-' + key.replace(/[A-Z]/g, function (c) { return '-' + c.toLowerCase(); });
  }
  function sortBy(table, key, ascending) {
    var body = table.tBodies[0];
    var rows = Array.prototype.slice.call(body.rows);
    rows.sort(function (a, b) {
      var d = parseFloat(a.getAttribute(attr(key))) - parseFloat(b.getAttribute(attr(key)));
      return ascending ? d : -d;
    });
    rows.forEach(function (r) { body.appendChild(r); });
  }
  document.querySelectorAll('table.sortable').forEach(function (table) {
    table.querySelectorAll('th[data-key]').forEach(function (th) {
      var button = document.createElement('button');
      button.type = 'button';
      button.className = 'sort';
      button.textContent = th.textContent;
      th.textContent = '';
      th.appendChild(button);
      button.addEventListener('click', function () {
        var ascending = th.getAttribute('aria-sort') !== 'ascending';
        table.querySelectorAll('th[aria-sort]').forEach(function (o) { o.removeAttribute('aria-sort'); });
        th.setAttribute('aria-sort', ascending ? 'ascending' : 'descending');
        sortBy(table, th.getAttribute('data-key'), ascending);
      });
    });
  });
}());
