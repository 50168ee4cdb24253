package app.latentledger.cli;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * The options every calculation shares: {@code --units ip|si} and the site pressure from
 * {@code --elevation} (ft | m) or {@code --pressure} (psia | kPa). Values typed in the tech's units
 * are converted to SI here, once.
 */
final class UnitOptions {
    private UnitOptions() {
    }

    static UnitSystem units(Args args) {
        return units(args, UnitSystem.IP);
    }

    /** {@code --units}, or {@code fallback} (the tech's stored setting) when not given. */
    static UnitSystem units(Args args, UnitSystem fallback) {
        String u = args.value("units");
        if (u == null) {
            return fallback;
        }
        try {
            return UnitSystem.parse(u);
        } catch (IllegalArgumentException e) {
            throw new UsageException("--units " + e.getMessage());
        }
    }

    static SitePressure site(Args args, UnitSystem units) {
        return site(args, units, 0.0);
    }

    /**
     * The site pressure from {@code --elevation} or {@code --pressure}; with neither, the standard
     * atmosphere at {@code defaultElevationM} (the tech's stored default elevation; 0 m is sea level).
     */
    static SitePressure site(Args args, UnitSystem units, double defaultElevationM) {
        Double elevation = args.number("elevation");
        Double pressure = args.number("pressure");
        if (elevation != null && pressure != null) {
            throw new UsageException("give --elevation or --pressure, not both");
        }
        try {
            if (pressure != null) {
                return SitePressure.measured(Quantity.PRESSURE.fromDisplay(units, pressure));
            }
            if (elevation != null) {
                return SitePressure.fromElevation(Quantity.ELEVATION.fromDisplay(units, elevation));
            }
            return SitePressure.fromElevation(defaultElevationM);
        } catch (InvalidInputException e) {
            throw refused(e, units, elevation != null ? "--elevation" : "--pressure");
        }
    }

    /** A typed value converted to SI, or null when the option is absent. */
    static Double si(Args args, String option, Quantity q, UnitSystem units) {
        Double v = args.number(option);
        return v == null ? null : q.fromDisplay(units, v);
    }

    /** The core's refusal, said in the tech's units and naming the option typed. */
    static UsageException refused(InvalidInputException e, UnitSystem units, String option) {
        UsageException u = new UsageException((option == null ? "" : option + ": ") + e.message(units));
        u.initCause(e); // a batch row reports the field, value and range apart (BatchRefusal)
        return u;
    }
}
