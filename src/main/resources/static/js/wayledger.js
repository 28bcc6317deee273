// Small page behaviours kept out of the markup so the Content-Security-Policy can forbid inline
// script: a print button, a confirmation before a destructive form, a select that submits its form.
document.addEventListener("click", (event) => {
  if (event.target.closest("[data-print]")) {
    window.print();
  }
});
document.addEventListener("submit", (event) => {
  const form = event.target.closest("form[data-confirm]");
  if (form && !window.confirm(form.dataset.confirm)) {
    event.preventDefault();
  }
});
document.addEventListener("change", (event) => {
  const select = event.target.closest("select[data-autosubmit]");
  if (select && select.form) {
    select.form.requestSubmit();
  }
});

// The upload page's progress bar; htmx events bubble to the document, so this survives swaps.
document.addEventListener("htmx:xhr:progress", (event) => {
  const bar = document.getElementById("upload-bar");
  if (bar && event.target.closest("#upload-form") && event.detail.lengthComputable) {
    bar.setAttribute("value", (event.detail.loaded / event.detail.total) * 100);
  }
});

// A schedule badge links to its circuit's findings ("#findings-c7"). Advice lines are fetched when
// their fold is opened, so a badge whose line is not on the page yet opens the fold and goes to the
// line once it has arrived.
document.addEventListener("click", (event) => {
  const link = event.target.closest('a[href^="#findings-c"]');
  const fold = document.querySelector("details.advice-rows[hx-get]");
  if (!link || !fold || fold.open || document.getElementById(link.hash.slice(1))) {
    return;
  }
  event.preventDefault();
  const id = link.hash.slice(1);
  const arrived = () => {
    if (document.getElementById(id)) {
      document.removeEventListener("htmx:afterSettle", arrived);
      window.location.hash = id;
    }
  };
  document.addEventListener("htmx:afterSettle", arrived);
  fold.open = true;
});
