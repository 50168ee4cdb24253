package app.latentledger.report.pdf;

import app.latentledger.chart.draw.Colour;
import app.latentledger.chart.draw.Stroke;
import app.latentledger.chart.draw.TextStyle;

import java.util.ArrayList;
import java.util.List;

/** Wrapped paragraphs, headings and rules set into a {@link PageFlow}. */
public final class Typeset {
    private final PageFlow flow;

    public Typeset(PageFlow flow) {
        this.flow = flow;
    }

    public PageFlow flow() {
        return flow;
    }

    /** Line height for a style, pt. */
    public static double leading(TextStyle style) {
        return style.size() * Ink.LEADING;
    }

    /**
     * Greedy word wrap to {@code width} pt; a word longer than the line is broken where it must
     * be. Explicit line breaks are kept.
     */
    public List<String> wrap(String text, double width, TextStyle style) {
        List<String> lines = new ArrayList<>();
        ReportFonts m = flow.fonts();
        for (String para : text.split("\n", -1)) {
            StringBuilder line = new StringBuilder();
            for (String word : para.split(" +")) {
                if (word.isEmpty()) {
                    continue;
                }
                String candidate = line.length() == 0 ? word : line + " " + word;
                if (m.width(candidate, style.size(), style.bold()) <= width) {
                    line.setLength(0);
                    line.append(candidate);
                    continue;
                }
                if (line.length() > 0) {
                    lines.add(line.toString());
                    line.setLength(0);
                }
                String rest = word;
                while (m.width(rest, style.size(), style.bold()) > width && rest.length() > 1) {
                    int cut = rest.length() - 1;
                    while (cut > 1 && m.width(rest.substring(0, cut), style.size(), style.bold()) > width) {
                        cut--;
                    }
                    lines.add(rest.substring(0, cut));
                    rest = rest.substring(cut);
                }
                line.append(rest);
            }
            lines.add(line.toString());
        }
        return lines;
    }

    /** Height a wrapped paragraph takes, pt. */
    public double height(String text, double width, TextStyle style) {
        return wrap(text, width, style).size() * leading(style);
    }

    /** A wrapped paragraph from the cursor, breaking pages between lines; then a small gap. */
    public void paragraph(String text, TextStyle style, double indent) {
        paragraph(text, style, indent, flow.width() - indent);
        flow.advance(style.size() * 0.45);
    }

    /** A wrapped paragraph in a column {@code width} pt wide starting {@code indent} from the margin. */
    public void paragraph(String text, TextStyle style, double indent, double width) {
        double lead = leading(style);
        for (String line : wrap(text, width, style)) {
            flow.need(lead);
            flow.painter().text(flow.left() + indent, flow.y() + style.size(), line, style);
            flow.advance(lead);
        }
    }

    /**
     * A paragraph that opens with {@code label} in bold and runs on in {@code style}, wrapped in a
     * column {@code width} pt wide from {@code indent}.
     */
    public void leadIn(String label, String text, TextStyle style, double indent, double width) {
        text = text.replaceAll("\\s+", " ").trim();
        TextStyle bold = style.emphasised();
        double labelWidth = flow.fonts().width(label, style.size(), true);
        double lead = leading(style);
        if (labelWidth > width * 0.6) {
            paragraph(label, bold, indent, width);
            paragraph(text, style, indent, width);
            return;
        }
        List<String> first = wrap(text, width - labelWidth, style);
        String head = first.isEmpty() ? "" : first.get(0);
        String rest = text.length() > head.length() ? text.substring(Math.min(text.length(), head.length())).trim() : "";
        flow.need(lead);
        flow.painter().text(flow.left() + indent, flow.y() + style.size(), label, bold);
        flow.painter().text(flow.left() + indent + labelWidth, flow.y() + style.size(), head, style);
        flow.advance(lead);
        if (!rest.isEmpty()) {
            paragraph(rest, style, indent, width);
        }
    }

    /** Height of a {@link #leadIn} paragraph, pt. */
    public double leadInHeight(String label, String text, TextStyle style, double width) {
        text = text.replaceAll("\\s+", " ").trim();
        double labelWidth = flow.fonts().width(label, style.size(), true);
        if (labelWidth > width * 0.6) {
            return height(label, width, style.emphasised()) + height(text, width, style);
        }
        List<String> first = wrap(text, width - labelWidth, style);
        String head = first.isEmpty() ? "" : first.get(0);
        String rest = text.length() > head.length() ? text.substring(head.length()).trim() : "";
        return leading(style) + (rest.isEmpty() ? 0 : height(rest, width, style));
    }

    /** A bullet point: "•" hanging in the indent, wrapped text beside it. */
    public void bullet(String text, TextStyle style, double indent) {
        double lead = leading(style);
        List<String> lines = wrap(text, flow.width() - indent - 11, style);
        for (int i = 0; i < lines.size(); i++) {
            flow.need(lead);
            if (i == 0) {
                flow.painter().text(flow.left() + indent, flow.y() + style.size(), "•", style);
            }
            flow.painter().text(flow.left() + indent + 11, flow.y() + style.size(), lines.get(i), style);
            flow.advance(lead);
        }
        flow.advance(style.size() * 0.2);
    }

    /** A section heading with a thin rule under it, kept with at least {@code keepWith} pt of what follows. */
    public void heading(String text, double keepWith) {
        TextStyle h = Ink.HEADING;
        flow.need(leading(h) + 10 + keepWith);
        if (flow.y() > flow.left() + 1) {
            flow.advance(8);
        }
        flow.painter().text(flow.left(), flow.y() + h.size(), text, h);
        flow.advance(h.size() + 5);
        rule(Ink.ACCENT, 0.8);
        flow.advance(7);
    }

    /** A smaller bold heading, kept with {@code keepWith} pt. */
    public void subheading(String text, double keepWith) {
        TextStyle h = Ink.SUBHEADING;
        flow.need(leading(h) + keepWith);
        flow.advance(3);
        paragraph(text, h, 0, flow.width());
        flow.advance(1);
    }

    public void rule(Colour colour, double width) {
        flow.painter().line(flow.left(), flow.y(), flow.left() + flow.width(), flow.y(), Stroke.solid(colour, width));
    }

    public void gap(double pt) {
        flow.advance(pt);
    }
}
