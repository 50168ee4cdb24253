package app.latentledger.report;

import app.latentledger.chart.draw.Stroke;
import app.latentledger.core.findings.Cautions;
import app.latentledger.report.pdf.Ink;
import app.latentledger.report.pdf.PageFlow;
import app.latentledger.report.pdf.Typeset;

/** Safety, the limits of the report, how the numbers were made, and the signature block. */
final class ClosingSection {
    /** What this report is and is not; the deferral to local codes and licensed practice. */
    static final String LIMITS = "This report records measurements taken on the visit and the calculations made"
            + " from them. It is not a design, an inspection or a permit, and it does not replace the judgement of"
            + " the licensed professional responsible for the work. Local codes and licensed practice govern any"
            + " repair, alteration or replacement.";

    static final String METHOD = "Psychrometric properties and the coil's sensible, latent and moisture figures follow"
            + " the ASHRAE Handbook—Fundamentals, ch. 1, at the site pressure (measured, or the standard atmosphere at"
            + " the site elevation). Uncertainties are expanded uncertainties (k = 2) propagated from the instrument"
            + " tolerances by the first-order method of the GUM (JCGM 100:2008). Logged runs are analysed with the"
            + " part-load latent model described in the methods notes. Every figure can be exported with its unit"
            + " and uncertainty as CSV or JSON.";

    private final ReportData data;

    ClosingSection(ReportData data) {
        this.data = data;
    }

    void write(Typeset t) {
        t.heading("Safety and the limits of this report", 90);
        t.paragraph(Cautions.SAFETY_LINE, Ink.BODY, 0);
        t.paragraph(LIMITS, Ink.BODY, 0);
        t.subheading("How the numbers were worked out", 30);
        t.paragraph(METHOD, Ink.SMALL, 0);
        signatures(t);
    }

    private void signatures(Typeset t) {
        PageFlow f = t.flow();
        double boxHeight = 92;
        t.heading("Signatures", boxHeight + 10);
        double gap = 18;
        double w = (f.width() - gap) / 2;
        double top = f.y();
        var paperwork = data.paperwork().of(data.latest().visit().id());
        var techSigned = paperwork.technician();
        var customerSigned = paperwork.customer();
        String tech = techSigned != null ? techSigned.name() : data.latest().visit().technician();
        box(f, f.left(), top, w, boxHeight, "Technician", tech, signedText(techSigned));
        box(f, f.left() + w + gap, top, w, boxHeight, "Customer or commissioning authority",
                customerSigned == null ? "" : customerSigned.name(), signedText(customerSigned));
        f.advance(boxHeight + 8);
        if (techSigned != null && !techSigned.remark().isEmpty()) {
            t.paragraph("Technician's remark: " + techSigned.remark(), Ink.SMALL, 0);
        }
        if (customerSigned != null && !customerSigned.remark().isEmpty()) {
            t.paragraph("Customer's remark: " + customerSigned.remark(), Ink.SMALL, 0);
        }
    }

    /** "Signed on the tablet 16 July 2026, 10:05 (−04:00)" for a recorded sign-off, else "". */
    private static String signedText(app.latentledger.core.records.SignOff s) {
        if (s == null) {
            return "";
        }
        return "Signed on the tablet " + PlainWords.dateTime(s.signedAt());
    }

    private static void box(PageFlow f, double x, double y, double w, double h, String role, String name,
                            String signed) {
        var p = f.painter();
        p.rect(x, y, w, h, null, Stroke.solid(Ink.RULE, 0.8));
        p.text(x + 8, y + 14, role, Ink.LABEL.emphasised());
        double line1 = y + 44;
        double line2 = y + 78;
        p.text(x + 8, line1 - 3, "Name", Ink.SMALL);
        if (!name.isEmpty()) {
            p.text(x + 44, line1 - 4, name, Ink.BODY);
        }
        p.line(x + 42, line1, x + w - 8, line1, Stroke.solid(Ink.MUTED, 0.5));
        if (!signed.isEmpty()) {
            // one line inside the box: a long remark is cut with an ellipsis
            String shown = signed;
            while (shown.length() > 1 && f.fonts().width(shown, Ink.SMALL.size(), false) > w - 16) {
                shown = shown.substring(0, shown.length() - 2) + "…";
            }
            p.text(x + 8, line1 + 14, shown, Ink.SMALL);
        }
        p.text(x + 8, line2 - 3, "Signature", Ink.SMALL);
        p.line(x + 50, line2, x + w * 0.62, line2, Stroke.solid(Ink.MUTED, 0.5));
        p.text(x + w * 0.62 + 6, line2 - 3, "Date", Ink.SMALL);
        p.line(x + w * 0.62 + 30, line2, x + w - 8, line2, Stroke.solid(Ink.MUTED, 0.5));
    }
}
