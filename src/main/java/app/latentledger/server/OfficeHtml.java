package app.latentledger.server;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The office page's HTML: one layout, a little CSS, no script. Every value from the database or the
 * request goes through {@link #esc}, so a site named {@code <script>} is shown as text, never run.
 */
final class OfficeHtml {
    private static final String CSS = "body{font-family:system-ui,sans-serif;margin:0;color:#1d2a33;background:#f6f8f9}"
            + "header{background:#1d4e63;color:#fff;padding:.6em 1em;display:flex;gap:1.2em;align-items:center}"
            + "header a{color:#fff}header form{margin-left:auto}main{padding:1em;max-width:60em}"
            + "table{border-collapse:collapse;width:100%;background:#fff}td,th{border:1px solid #cfd8dc;padding:.3em .5em;"
            + "text-align:left;vertical-align:top}.verdict{font-weight:bold}.fix{color:#8a1c1c}.error{color:#8a1c1c}"
            + ".code{font-family:monospace;font-size:1.4em;background:#fff;padding:.3em .6em;border:2px solid #1d4e63}"
            + "input,button{font-size:1em;padding:.3em}label{display:block;margin:.4em 0}";

    private OfficeHtml() {
    }

    /** HTML-escapes text for element content and quoted attribute values. */
    static String esc(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    /**
     * A whole page. {@code body} must already be escaped HTML.
     *
     * @param session the signed-in session (for the header's log-out form), or null on the login page
     */
    static Reply page(int status, String title, OfficeSessions.Session session, String body) {
        StringBuilder b = new StringBuilder("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\">"
                + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"><title>")
                .append(esc(title)).append(" · Latent Ledger office</title><style>").append(CSS)
                .append("</style></head><body><header><strong>Latent Ledger office</strong>");
        if (session != null) {
            b.append("<a href=\"/office\">Visits</a><a href=\"/office/people\">Technicians and devices</a>")
                    .append("<span>").append(esc(session.personName())).append(" · ").append(esc(session.companyName()))
                    .append("</span><form method=\"post\" action=\"/office/logout\">").append(csrfField(session))
                    .append("<button type=\"submit\">Log out</button></form>");
        }
        b.append("</header><main><h1>").append(esc(title)).append("</h1>").append(body).append("</main></body></html>");
        Map<String, String> h = new LinkedHashMap<>();
        h.put("Content-Type", "text/html; charset=utf-8");
        h.put("Cache-Control", "no-store");
        // no script anywhere, no framing, no guessing of types
        h.put("Content-Security-Policy", "default-src 'none'; style-src 'unsafe-inline'; form-action 'self';"
                + " frame-ancestors 'none'");
        h.put("X-Content-Type-Options", "nosniff");
        h.put("Referrer-Policy", "no-referrer");
        return new Reply(status, h, b.toString().getBytes(StandardCharsets.UTF_8));
    }

    static String csrfField(OfficeSessions.Session session) {
        return "<input type=\"hidden\" name=\"csrf\" value=\"" + esc(session.csrf()) + "\">";
    }

    /** 303 to another page (after a form post, so a reload does not post again). */
    static Reply redirect(String location) {
        Map<String, String> h = new LinkedHashMap<>();
        h.put("Location", location);
        h.put("Cache-Control", "no-store");
        return new Reply(303, h, new byte[0]);
    }
}
