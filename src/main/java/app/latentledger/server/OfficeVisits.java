package app.latentledger.server;

import app.latentledger.bundle.Bundles;
import app.latentledger.bundle.BundleException;
import app.latentledger.core.InvalidInputException;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.report.PlainWords;
import app.latentledger.report.VisitReport;
import app.latentledger.store.Ledger;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import static app.latentledger.server.OfficeHtml.esc;

/**
 * The office page's visits: a search over the company's sites and visits, and one visit with each
 * reading set's verdict and findings, worked out by the core's coil check from the current revisions
 * (the same {@link ReadingSetCheck} and the same words as the app and the report).
 */
final class OfficeVisits {
    static final int MAX_QUERY = 200;
    private static final int MAX_ROWS = 200;

    private final OfficeDatabase db;
    private final VisitBundles bundles;

    OfficeVisits(OfficeDatabase db, VisitBundles bundles) {
        this.db = db;
        this.bundles = bundles;
    }

    /** The search page: the company's visits whose site name, address or technician contains the words. */
    Reply search(OfficeSessions.Session s, String query) {
        String q = query == null ? "" : query.strip();
        if (q.length() > MAX_QUERY) {
            throw OfficePages.badInput("q", q, "0 to " + MAX_QUERY + " characters");
        }
        StringBuilder b = new StringBuilder("<form method=\"get\" action=\"/office\"><label>Site name, address or"
                + " technician <input type=\"search\" name=\"q\" value=\"").append(esc(q))
                .append("\" maxlength=\"" + MAX_QUERY + "\"></label><button type=\"submit\">Search</button></form>");
        b.append("<table><thead><tr><th>Started</th><th>Site</th><th>Address</th><th>Technician</th><th>Purpose</th>"
                + "</tr></thead><tbody>");
        int rows = Sql.inTransaction(db, c -> {
            int n = 0;
            try (PreparedStatement ps = c.prepareStatement("select v.id, v.body ->> 'startedAt', v.body ->> 'technician',"
                    + " v.body ->> 'purpose', s.body ->> 'name', s.body ->> 'address' from record_revision v"
                    + " join record_revision s on s.company_id = v.company_id and s.kind = 'site' and s.current"
                    + " and not s.deleted and s.id = v.body ->> 'siteId'"
                    + " where v.company_id = ? and v.kind = 'visit' and v.current and not v.deleted"
                    + " and (s.body ->> 'name' ilike ? escape '\\' or coalesce(s.body ->> 'address', '') ilike ? escape '\\'"
                    + " or coalesce(v.body ->> 'technician', '') ilike ? escape '\\')"
                    + " order by v.body ->> 'startedAt' desc limit " + MAX_ROWS)) {
                String like = "%" + q.replace("\\", "\\\\").replace("%", "\\%").replace("_", "\\_") + "%";
                ps.setObject(1, s.companyId());
                ps.setString(2, like);
                ps.setString(3, like);
                ps.setString(4, like);
                ResultSet rs = ps.executeQuery();
                while (rs.next()) {
                    n++;
                    b.append("<tr><td><a href=\"/office/visits/").append(esc(rs.getString(1))).append("\">")
                            .append(esc(rs.getString(2))).append("</a></td><td>").append(esc(rs.getString(5)))
                            .append("</td><td>").append(esc(rs.getString(6))).append("</td><td>")
                            .append(esc(rs.getString(3))).append("</td><td>").append(esc(rs.getString(4)))
                            .append("</td></tr>");
                }
            }
            return n;
        });
        b.append("</tbody></table><p>").append(rows == 0 ? "No visit matches." : rows + " visit" + (rows == 1 ? "" : "s")
                + (rows == MAX_ROWS ? " (the latest " + MAX_ROWS + "; narrow the search)" : "")).append("</p>");
        return OfficeHtml.page(200, "Visits", s, b.toString());
    }

    /** What the visit page shows, read in one transaction: 404 for another company's or a deleted visit. */
    private record Loaded(Visit visit, Site site, HvacSystem system, List<ReadingSet> readings) {
    }

    private Loaded load(OfficeSessions.Session s, String visitId) {
        return Sql.inTransaction(db, c -> {
            Visit v = WireCodec.visit(live(c, s, SyncKind.VISIT, visitId).body());
            Site site = WireCodec.site(live(c, s, SyncKind.SITE, v.siteId()).body());
            HvacSystem system = WireCodec.system(live(c, s, SyncKind.SYSTEM, v.systemId()).body());
            List<ReadingSet> sets = SyncService.currentOfVisit(c, s.companyId(), SyncKind.READINGS, visitId)
                    .stream().filter(r -> !r.deleted()).map(r -> WireCodec.readingSet(r.body()))
                    .sorted(Comparator.comparing(ReadingSet::takenAt)).toList();
            return new Loaded(v, site, system, sets);
        });
    }

    private static SyncService.Current live(java.sql.Connection c, OfficeSessions.Session s, SyncKind kind, String id)
            throws java.sql.SQLException {
        return SyncService.currentOf(c, s.companyId(), kind, id).filter(r -> !r.deleted())
                .orElseThrow(() -> ApiError.notFound("There is no such visit."));
    }

    /** One visit: its site, system, and each reading set's verdict and findings. */
    Reply visit(OfficeSessions.Session s, String visitId, UnitSystem units) {
        Loaded l = load(s, visitId);
        String id = esc(visitId);
        StringBuilder b = new StringBuilder("<table><tbody>")
                .append(row("Site", l.site().name())).append(row("Address", l.site().address()))
                .append(row("System", l.system().label() + " (" + PlainWords.systemType(l.system().type()) + ")")).append(row("Started", PlainWords.dateTime(l.visit().startedAt())))
                .append(row("Technician", l.visit().technician())).append(row("Purpose", PlainWords.purpose(l.visit().purpose())))
                .append("</tbody></table>");
        b.append("<p><a href=\"/office/visits/").append(id).append("/bundle\">Download the visit bundle</a> · ")
                .append("<a href=\"/office/visits/").append(id).append("/report.pdf?units=").append(units.name().toLowerCase())
                .append("\">Download the PDF report</a> · Units: <a href=\"?units=si\">SI</a> <a href=\"?units=ip\">IP</a></p>");
        b.append("<h2>Reading sets</h2>");
        if (l.readings().isEmpty()) {
            b.append("<p>No reading sets in this visit yet.</p>");
        }
        for (ReadingSet rs : l.readings()) {
            String name = rs.label().isEmpty() ? "Readings " + PlainWords.time(rs.takenAt()) : rs.label();
            b.append("<section class=\"readings\"><h3>").append(esc(name)).append("</h3>");
            List<String> missing = ReadingSetCheck.missing(rs);
            if (!missing.isEmpty()) {
                b.append("<p>Not worked out: the coil check still needs ").append(esc(String.join(", ", missing)))
                        .append(".</p></section>");
                continue;
            }
            CoilResult r;
            try {
                r = ReadingSetCheck.run(rs, l.system(), l.site(), ThresholdSettings.DEFAULTS, units);
            } catch (InvalidInputException e) {
                b.append("<p>Not worked out: ").append(esc(e.message(units))).append("</p></section>");
                continue;
            }
            b.append("<p class=\"verdict\">").append(esc(PlainWords.verdict(r.verdict()))).append("</p>");
            if (r.findings().isEmpty()) {
                b.append("<p>No findings.</p>");
            } else {
                b.append("<ul class=\"findings\">");
                for (Finding f : r.findings()) {
                    b.append("<li class=\"").append(esc(f.severity().name().toLowerCase())).append("\"><strong>")
                            .append(esc(PlainWords.severity(f.severity()))).append(":</strong> ").append(esc(f.message()))
                            .append("<br><small>").append(esc(f.technical())).append(" (").append(esc(f.code().key()))
                            .append(")</small></li>");
                }
                b.append("</ul>");
            }
            b.append("</section>");
        }
        return OfficeHtml.page(200, "Visit at " + l.site().name(), s, b.toString());
    }

    private static String row(String label, String value) {
        return "<tr><th>" + esc(label) + "</th><td>" + esc(value) + "</td></tr>";
    }

    /** The visit bundle, by the API's own {@link VisitBundles}. */
    Reply bundle(OfficeSessions.Session s, String visitId) {
        return bundles.bundle(s.caller(), visitId);
    }

    /**
     * The PDF report: the visit's bundle is imported into a throwaway ledger and the project's own
     * report is written from it, so the office's PDF is the one the tablet would print.
     */
    Reply report(OfficeSessions.Session s, String visitId, UnitSystem units) {
        Reply zip = bundles.bundle(s.caller(), visitId);
        Path dir = null;
        try {
            dir = Files.createTempDirectory("office-report-");
            Path file = dir.resolve("visit.zip");
            Files.write(file, zip.body());
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            try (Ledger ledger = Ledger.open(dir.resolve("ledger"))) {
                Bundles.importBundle(ledger, file);
                VisitReport.write(ledger, visitId, null, PaperSize.A4, units, out);
            }
            return Reply.bytes(200, "application/pdf", out.toByteArray())
                    .withHeader("Content-Disposition", "attachment; filename=\"report-" + visitId + ".pdf\"");
        } catch (BundleException e) {
            throw new IllegalStateException("the server's own bundle of visit " + visitId + " did not import", e);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            deleteTree(dir);
        }
    }

    private static void deleteTree(Path dir) {
        if (dir == null) {
            return;
        }
        try (Stream<Path> all = Files.walk(dir)) {
            all.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a temporary folder left behind is harmless; the OS clears /tmp
        }
    }
}
