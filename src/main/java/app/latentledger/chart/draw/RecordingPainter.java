package app.latentledger.chart.draw;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.List;

/**
 * Keeps every drawing call as data, with the group it was drawn in, so tests can check geometry
 * without a window and other back ends can be compared against it.
 */
public final class RecordingPainter implements Painter {

    /** One recorded call. {@code group} is the innermost group name, "" outside any group. */
    public sealed interface Op permits Save, Restore, Clip, Line, Polyline, Polygon, Rect, Circle, Text {
        String group();
    }

    public record Save(String group) implements Op { }

    public record Restore(String group) implements Op { }

    public record Clip(String group, double x, double y, double width, double height) implements Op { }

    public record Line(String group, double x1, double y1, double x2, double y2, Stroke stroke) implements Op { }

    /** Points copied at the time of the call. */
    public record Polyline(String group, double[] xs, double[] ys, Stroke stroke) implements Op { }

    public record Polygon(String group, double[] xs, double[] ys, Colour fill, Stroke stroke) implements Op { }

    public record Rect(String group, double x, double y, double width, double height, Colour fill, Stroke stroke)
            implements Op { }

    public record Circle(String group, double cx, double cy, double radius, Colour fill, Stroke stroke) implements Op { }

    public record Text(String group, double x, double y, String text, TextStyle style) implements Op { }

    private final List<Op> ops = new ArrayList<>();
    private final Deque<String> groups = new ArrayDeque<>();
    private final TextMeasurer measurer;
    private int depth;

    public RecordingPainter() {
        this(TextMeasurer.ESTIMATE);
    }

    public RecordingPainter(TextMeasurer measurer) {
        this.measurer = measurer;
    }

    private String group() {
        return groups.isEmpty() ? "" : groups.peek();
    }

    @Override
    public void save() {
        depth++;
        ops.add(new Save(group()));
    }

    @Override
    public void restore() {
        if (depth == 0) {
            throw new IllegalStateException("restore() without a matching save()");
        }
        depth--;
        ops.add(new Restore(group()));
    }

    @Override
    public void clip(double x, double y, double width, double height) {
        ops.add(new Clip(group(), x, y, width, height));
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, Stroke stroke) {
        ops.add(new Line(group(), x1, y1, x2, y2, stroke));
    }

    @Override
    public void polyline(double[] xs, double[] ys, int count, Stroke stroke) {
        ops.add(new Polyline(group(), Arrays.copyOf(xs, count), Arrays.copyOf(ys, count), stroke));
    }

    @Override
    public void polygon(double[] xs, double[] ys, int count, Colour fill, Stroke stroke) {
        ops.add(new Polygon(group(), Arrays.copyOf(xs, count), Arrays.copyOf(ys, count), fill, stroke));
    }

    @Override
    public void rect(double x, double y, double width, double height, Colour fill, Stroke stroke) {
        ops.add(new Rect(group(), x, y, width, height, fill, stroke));
    }

    @Override
    public void circle(double cx, double cy, double radius, Colour fill, Stroke stroke) {
        ops.add(new Circle(group(), cx, cy, radius, fill, stroke));
    }

    @Override
    public void text(double x, double y, String text, TextStyle style) {
        ops.add(new Text(group(), x, y, text, style));
    }

    @Override
    public TextMeasurer measurer() {
        return measurer;
    }

    @Override
    public void beginGroup(String name) {
        groups.push(name);
    }

    @Override
    public void endGroup() {
        if (groups.isEmpty()) {
            throw new IllegalStateException("endGroup() without a matching beginGroup()");
        }
        groups.pop();
    }

    /** Every call so far, in order. */
    public List<Op> ops() {
        return List.copyOf(ops);
    }

    /** The calls of one kind drawn inside the named group (or any group, if {@code group} is null). */
    public <T extends Op> List<T> ops(Class<T> kind, String group) {
        List<T> out = new ArrayList<>();
        for (Op op : ops) {
            if (kind.isInstance(op) && (group == null || group.equals(op.group()))) {
                out.add(kind.cast(op));
            }
        }
        return out;
    }

    /** All strings drawn, in order. */
    public List<String> texts() {
        List<String> out = new ArrayList<>();
        for (Text t : ops(Text.class, null)) {
            out.add(t.text());
        }
        return out;
    }

    /** True when every save has been restored and every group ended. */
    public boolean balanced() {
        return depth == 0 && groups.isEmpty();
    }

    public void clear() {
        ops.clear();
        groups.clear();
        depth = 0;
    }
}
