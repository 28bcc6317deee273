// Any button with the class "print-page" prints the page (no inline handlers: the pages run under a
// strict content security policy).
document.querySelectorAll("button.print-page").forEach(function (button) {
  button.hidden = false;
  button.addEventListener("click", function () {
    window.print();
  });
});
