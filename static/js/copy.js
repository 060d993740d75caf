// Copy buttons: <button class="copy" data-copy="ID" hidden> copies the value (or text) of the element ID.
// Without JavaScript the buttons stay hidden and the read-only field can be selected by hand.
(function () {
  "use strict";
  function copied(button, text) {
    var status = button.parentNode.querySelector(".copied");
    if (status) {
      status.textContent = text;
    }
  }
  document.querySelectorAll("button.copy[data-copy]").forEach(function (button) {
    var target = document.getElementById(button.getAttribute("data-copy"));
    if (!target) {
      return;
    }
    button.hidden = false;
    button.addEventListener("click", function () {
      var text = target.value !== undefined ? target.value : target.textContent;
      if (navigator.clipboard && window.isSecureContext) {
        navigator.clipboard.writeText(text).then(function () { copied(button, "Copied"); },
          function () { target.select(); copied(button, "Selected: press Ctrl+C"); });
      } else {
        target.select();
        var ok = false;
        try { ok = document.execCommand("copy"); } catch (e) { ok = false; }
        copied(button, ok ? "Copied" : "Selected: press Ctrl+C");
      }
    });
  });
}());
