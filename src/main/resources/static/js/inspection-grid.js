// Result grid: Enter moves down a column, values are checked as typed, and a block pasted from a spreadsheet
// fills the grid from the cell it is pasted into. Plain script, no framework; the server validates again.
(function () {
  "use strict";
  var grid = document.getElementById("results");
  if (!grid) {
    return;
  }
  var READING = /^\s*(?:[<>≥≤]=?\s*)?\d+(?:[.,]\d+)?\s*$/;

  function rows() {
    return Array.prototype.slice.call(grid.querySelectorAll("tbody tr"));
  }

  function cellsOf(row) {
    return Array.prototype.slice.call(row.querySelectorAll("input[data-col], select[data-col]"));
  }

  function check(input) {
    if (input.tagName !== "INPUT" || input.type !== "text") {
      return;
    }
    var ok = input.value.trim() === "" || READING.test(input.value);
    input.classList.toggle("invalid", !ok);
    input.setAttribute("aria-invalid", ok ? "false" : "true");
    input.title = ok ? "" : "Enter a number, such as 0.45 or >299";
  }

  function moveDown(from) {
    var row = from.closest("tr");
    var col = from.getAttribute("data-col");
    var all = rows();
    for (var i = all.indexOf(row) + 1; i < all.length; i++) {
      var next = all[i].querySelector("[data-col='" + col + "']");
      if (next) {
        next.focus();
        if (next.select) {
          next.select();
        }
        return;
      }
    }
    var after = document.getElementById("grade");
    if (after) {
      after.focus();
    }
  }

  function setValue(cell, text) {
    var value = text.trim();
    if (cell.tagName === "SELECT") {
      var v = value.toLowerCase();
      cell.value = /^(ok|yes|y|✓|pass|true|1)$/.test(v) ? "ok" : /^(wrong|no|n|✗|fail|false|0)$/.test(v) ? "wrong" : "";
    } else if (cell.type === "checkbox") {
      cell.checked = /^(s|yes|y|true|1|✓)$/i.test(value);
    } else {
      cell.value = value;
      check(cell);
    }
  }

  grid.addEventListener("keydown", function (event) {
    var target = event.target;
    if (event.key === "Enter" && target.hasAttribute("data-col")) {
      event.preventDefault();
      moveDown(target);
    }
  });

  grid.addEventListener("input", function (event) {
    check(event.target);
  });

  grid.addEventListener("paste", function (event) {
    var target = event.target;
    if (!target.hasAttribute("data-col")) {
      return;
    }
    var text = (event.clipboardData || window.clipboardData).getData("text");
    if (text.indexOf("\t") < 0 && text.indexOf("\n") < 0) {
      return;
    }
    event.preventDefault();
    var lines = text.replace(/\r/g, "").split("\n");
    while (lines.length && lines[lines.length - 1] === "") {
      lines.pop();
    }
    var all = rows();
    var startRow = all.indexOf(target.closest("tr"));
    var startCol = cellsOf(all[startRow]).indexOf(target);
    lines.forEach(function (line, i) {
      var row = all[startRow + i];
      if (!row) {
        return;
      }
      var cells = cellsOf(row);
      line.split("\t").forEach(function (value, j) {
        var cell = cells[startCol + j];
        if (cell) {
          setValue(cell, value);
        }
      });
    });
  });

  Array.prototype.forEach.call(grid.querySelectorAll("input[type=text]"), check);
})();
