package app.latentledger.core.records;

import java.util.Arrays;

/**
 * One column of a logged run, in SI. A missing sample is NaN.
 *
 * @param name     field name, e.g. "return_db", "supply_rh", "compressor"
 * @param unit     SI unit the values are in, e.g. "°C", "%", "on/off"
 * @param values   one value per sample time (the array is copied in and out)
 */
public record LogChannel(String name, String unit, double[] values) {
    public LogChannel {
        name = Check.text("log channel name", name, 64);
        unit = Check.optionalText("log channel unit", unit, 32);
        values = Check.present("log channel " + name + " values", values).clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /** The value at one sample, without copying the column. */
    public double value(int sample) {
        return values[sample];
    }

    public int size() {
        return values.length;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LogChannel c && c.name.equals(name) && c.unit.equals(unit)
                && Arrays.equals(c.values, values);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "LogChannel[" + name + " (" + unit + "), " + values.length + " samples]";
    }
}
