/** Small HTML helpers for the fakes' hand-operated pages (our own plain look, clearly marked as local test pages). */

export function escapeHtml(value: string): string {
  return value
    .replaceAll("&", "&amp;")
    .replaceAll("<", "&lt;")
    .replaceAll(">", "&gt;")
    .replaceAll('"', "&quot;")
    .replaceAll("'", "&#39;");
}

/**
 * Wraps content in a complete, accessible page: language, viewport, one <main>, a visible banner
 * saying this is a local test page so nobody mistakes it for a real service.
 */
export function renderPage(title: string, banner: string, content: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex">
<title>${escapeHtml(title)}</title>
<style>
  :root { color-scheme: light; font-family: system-ui, sans-serif; background: #f4f1e8; color: #1d2a1f; }
  body { margin: 0; }
  .banner { background: #1d2a1f; color: #fff; padding: 0.75rem 1rem; font-weight: 600; }
  main { max-width: 32rem; margin: 0 auto; padding: 1.25rem 1rem 3rem; }
  h1 { font-size: 1.5rem; margin: 0.5rem 0 1rem; }
  h2 { font-size: 1.125rem; margin: 1.75rem 0 0.5rem; }
  p { line-height: 1.5; }
  label { display: block; font-weight: 600; margin: 0.75rem 0 0.25rem; }
  input[type=text], input[type=email], input[type=tel], textarea {
    box-sizing: border-box; width: 100%; font: inherit; padding: 0.65rem; border: 2px solid #5b6b5d; border-radius: 0.4rem; background: #fff; color: inherit;
  }
  .check { display: flex; gap: 0.5rem; align-items: center; font-weight: 400; min-height: 2.75rem; }
  .check input { width: 1.5rem; height: 1.5rem; margin: 0; }
  button { font: inherit; min-height: 3rem; padding: 0.6rem 1rem; border-radius: 0.4rem; cursor: pointer; }
  .primary { background: #2f6b3a; color: #fff; border: 2px solid #2f6b3a; font-weight: 600; }
  .account { display: block; width: 100%; text-align: left; background: #fff; color: inherit; border: 2px solid #5b6b5d; margin: 0.5rem 0; }
  .account span { display: block; font-size: 0.9rem; color: #3c4a3e; }
  .secondary { background: transparent; color: #1d2a1f; border: 2px solid #5b6b5d; }
  :focus-visible { outline: 3px solid #c2410c; outline-offset: 2px; }
  pre { white-space: pre-wrap; word-break: break-word; background: #fff; padding: 0.75rem; border: 1px solid #5b6b5d; border-radius: 0.4rem; }
  .error { border-left: 4px solid #b91c1c; padding-left: 0.75rem; }
</style>
</head>
<body>
<div class="banner" role="note">${escapeHtml(banner)}</div>
<main>
${content}
</main>
</body>
</html>`;
}
