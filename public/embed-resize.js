// Sagline embed resizer: sizes every <iframe data-sagline-embed> to the height its chart reports.
// Only messages whose source is that very frame, from the frame's own origin, are trusted.
(function () {
  if (window.__saglineEmbedResize) return;
  window.__saglineEmbedResize = true;
  window.addEventListener("message", function (event) {
    var data = event.data;
    if (!data || data.type !== "sagline:embed-height" || typeof data.height !== "number") return;
    var frames = document.querySelectorAll("iframe[data-sagline-embed]");
    for (var i = 0; i < frames.length; i++) {
      var frame = frames[i];
      if (frame.contentWindow !== event.source) continue;
      var origin;
      try {
        origin = new URL(frame.src, document.baseURI).origin;
      } catch (_e) {
        return;
      }
      if (event.origin !== origin) return;
      var height = Math.max(80, Math.min(4000, Math.round(data.height)));
      frame.style.height = height + "px";
      frame.setAttribute("height", String(height));
      return;
    }
  });
})();
