// Pan and zoom for the server-drawn single-line diagram, without a library: zoom changes the SVG's
// width and height attributes (the viewBox keeps the drawing sharp), panning scrolls its frame.
// Without this file the frame still scrolls and every link works.
(function () {
  "use strict";
  var frame = document.getElementById("sld-frame");
  if (!frame) {
    return;
  }
  var svg = frame.querySelector("svg");
  if (!svg) {
    return;
  }
  var box = svg.viewBox.baseVal;
  var scale = 1;
  var MIN = 0.1;
  var MAX = 3;

  function apply(next, anchorX, anchorY) {
    next = Math.max(MIN, Math.min(MAX, next));
    var ax = anchorX === undefined ? frame.clientWidth / 2 : anchorX;
    var ay = anchorY === undefined ? frame.clientHeight / 2 : anchorY;
    var unitX = (frame.scrollLeft + ax) / scale;
    var unitY = (frame.scrollTop + ay) / scale;
    scale = next;
    svg.setAttribute("width", String(Math.round(box.width * scale)));
    svg.setAttribute("height", String(Math.round(box.height * scale)));
    frame.scrollLeft = unitX * scale - ax;
    frame.scrollTop = unitY * scale - ay;
    frame.setAttribute("data-scale", scale.toFixed(2));
  }

  function fit() {
    var byWidth = (frame.clientWidth - 4) / box.width;
    var byHeight = (frame.clientHeight - 4) / box.height;
    apply(Math.min(byWidth, byHeight, 1), 0, 0);
    frame.scrollLeft = 0;
    frame.scrollTop = 0;
  }

  document.querySelectorAll(".sld-zoom").forEach(function (button) {
    button.hidden = false;
    button.addEventListener("click", function () {
      var how = button.getAttribute("data-zoom");
      if (how === "in") {
        apply(scale * 1.25);
      } else if (how === "out") {
        apply(scale / 1.25);
      } else if (how === "fit") {
        fit();
      } else {
        apply(1);
      }
    });
  });
  document.querySelectorAll(".sld-print").forEach(function (button) {
    button.hidden = false;
    button.addEventListener("click", function () {
      window.print();
    });
  });

  frame.addEventListener(
    "wheel",
    function (event) {
      if (!event.ctrlKey) {
        return;
      }
      event.preventDefault();
      var rect = frame.getBoundingClientRect();
      apply(
        event.deltaY < 0 ? scale * 1.15 : scale / 1.15,
        event.clientX - rect.left,
        event.clientY - rect.top
      );
    },
    { passive: false }
  );

  frame.addEventListener("keydown", function (event) {
    if (event.key === "+" || event.key === "=") {
      apply(scale * 1.25);
    } else if (event.key === "-") {
      apply(scale / 1.25);
    } else if (event.key === "0") {
      fit();
    }
  });

  var drag = null;
  frame.addEventListener("pointerdown", function (event) {
    if (event.button !== 0 || event.target.closest("a")) {
      return;
    }
    drag = { x: event.clientX, y: event.clientY, left: frame.scrollLeft, top: frame.scrollTop };
    frame.classList.add("dragging");
    frame.setPointerCapture(event.pointerId);
  });
  frame.addEventListener("pointermove", function (event) {
    if (!drag) {
      return;
    }
    frame.scrollLeft = drag.left - (event.clientX - drag.x);
    frame.scrollTop = drag.top - (event.clientY - drag.y);
  });
  function stop() {
    drag = null;
    frame.classList.remove("dragging");
  }
  frame.addEventListener("pointerup", stop);
  frame.addEventListener("pointercancel", stop);

  // A link to one board (#sld-board-N, as after "show ways"), or the board chosen in "Go to board",
  // scrolls that board into view.
  var expanded = new URLSearchParams(location.search).get("expand");
  var wanted = location.hash ? location.hash.substring(1) : expanded ? "sld-board-" + expanded : "";
  var target = wanted && document.getElementById(wanted);
  if (target && target.getBBox) {
    var b = target.getBBox();
    frame.scrollLeft = b.x - 40;
    frame.scrollTop = b.y - 40;
  }
})();
