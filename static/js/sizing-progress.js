// Moves the progress bar of a running design search from its server-sent events instead of reloading the page.
// Progressive: without JavaScript the page refreshes itself every 2 s (the server's Refresh header). With it, the
// page asks once for its "live" form (no Refresh header), follows the events, and reloads when the search ends.
(function () {
  'use strict';
  var section = document.getElementById('progress');
  if (!section || !section.getAttribute('data-job')) {
    return;
  }
  var id = section.getAttribute('data-job');
  var params = new URLSearchParams(window.location.search);
  function plain() {
    params.delete('live');
    var rest = params.toString();
    window.location.replace(window.location.pathname + (rest ? '?' + rest : ''));
  }
  if (params.get('live') !== '1') {
    params.set('live', '1');
    window.location.replace(window.location.pathname + '?' + params.toString());
    return;
  }
  if (!window.EventSource) {
    window.setTimeout(plain, 2000);
    return;
  }
  var bar = document.getElementById('search-progress');
  var text = document.getElementById('search-progress-text');
  var source = new EventSource('/api/v1/sizing/jobs/' + encodeURIComponent(id) + '/events');
  source.addEventListener('progress', function (e) {
    var job = JSON.parse(e.data);
    var percent = Math.round(100 * job.fraction);
    bar.value = percent;
    bar.textContent = percent + ' %';
    text.textContent = percent + ' % (' + (job.stage || '') + ')';
    section.setAttribute('data-live', 'true');
  });
  source.addEventListener('end', function () {
    source.close();
    plain();
  });
  source.onerror = function () {
    // the events could not be followed (a busy server, a lost connection): fall back to reloading
    source.close();
    window.setTimeout(plain, 2000);
  };
}());
