package app.latentledger.core.visit;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.units.Quantity;

import java.util.List;

/**
 * The pressure and airflows a log is analysed at, and where each came from: the one rule the app,
 * the report and the command line share.
 *
 * <p>Pressure: the visit's first measured station pressure, else the standard atmosphere at the
 * site's elevation (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3). Airflow: the last reading set
 * that has one (the state the system was left running in while the logger ran), else one the tech
 * gave. Each airflow is range-checked here once against the analysis's range
 * ({@link RunCycleAnalysis#MIN_AIRFLOW_M3_PER_S} to {@link RunCycleAnalysis#MAX_AIRFLOW_M3_PER_S}); one
 * outside it is not used and {@link #refusal} says why, so every face analyses the log without
 * masses and states the same reason.
 *
 * @param pressurePa       site pressure, Pa
 * @param pressureFrom     "measured station pressure" or "standard atmosphere at the site's elevation"
 * @param airflowM3PerS    airflow for the masses during runs, m³/s, NaN when none is usable
 * @param airflowFrom      where it came from ("" when none)
 * @param fanAirflowM3PerS airflow with the blower alone (fan-only speed), m³/s; NaN means the same as
 *                         {@code airflowM3PerS}
 * @param refusal          why an airflow given was not used ("" when nothing was refused)
 */
public record LogConditions(double pressurePa, String pressureFrom, double airflowM3PerS, String airflowFrom,
                            double fanAirflowM3PerS, InvalidInputException refusal) {
    public static final String MEASURED_PRESSURE = "measured station pressure";
    public static final String STANDARD_PRESSURE = "standard atmosphere at the site's elevation";

    /** The airflow during rests: the fan-only airflow when given, else the run airflow. */
    public double restAirflowM3PerS() {
        return Double.isNaN(fanAirflowM3PerS) ? airflowM3PerS : fanAirflowM3PerS;
    }

    /** Whether an airflow was refused. */
    public boolean refused() {
        return refusal != null;
    }

    /**
     * @param sets           the visit's reading sets in the order taken
     * @param site           the visit's site (for its elevation)
     * @param givenAirflow   an airflow the tech gave, m³/s (NaN: none); used when no set has one
     * @param givenFanAirflow a fan-only airflow the tech gave, m³/s (NaN: none)
     * @param nameOf         how a reading set is named for the tech ("Readings 14:05", "Before")
     */
    public static LogConditions of(List<ReadingSet> sets, Site site, double givenAirflow, double givenFanAirflow,
                                   java.util.function.Function<ReadingSet, String> nameOf) {
        double pressure = StandardAtmosphere.pressurePa(site.elevationM());
        String pressureFrom = STANDARD_PRESSURE;
        for (ReadingSet rs : sets) {
            if (rs.stationPressurePa() != null) {
                pressure = rs.stationPressurePa().valueSi();
                pressureFrom = MEASURED_PRESSURE;
                break;
            }
        }
        double flow = Double.NaN;
        String from = "";
        for (ReadingSet rs : sets) {
            if (rs.airflow() != null) {
                flow = rs.airflow().volume().valueSi();
                from = "reading set " + nameOf.apply(rs);
            }
        }
        if (Double.isNaN(flow) && !Double.isNaN(givenAirflow)) {
            flow = givenAirflow;
            from = "given at import";
        }
        return checked(pressure, pressureFrom, flow, from, givenFanAirflow);
    }

    /**
     * Conditions given outright (the command line's flags, or those stored with a kept log), checked
     * by the same rule.
     */
    public static LogConditions checked(double pressurePa, String pressureFrom, double airflowM3PerS,
                                        String airflowFrom, double fanAirflowM3PerS) {
        InputLimits.checkPressure("pressure", pressurePa);
        InvalidInputException refusal = refusal("airflow", airflowM3PerS);
        double flow = refusal == null ? airflowM3PerS : Double.NaN;
        InvalidInputException fanRefusal = refusal("fan-only airflow", fanAirflowM3PerS);
        double fan = fanRefusal == null ? fanAirflowM3PerS : Double.NaN;
        return new LogConditions(pressurePa, pressureFrom, flow, Double.isNaN(flow) ? "" : airflowFrom, fan,
                refusal != null ? refusal : fanRefusal);
    }

    /** The refusal of an airflow outside the analysis's range, or null when it is in range or NaN. */
    static InvalidInputException refusal(String field, double m3PerS) {
        if (Double.isNaN(m3PerS)) {
            return null;
        }
        try {
            InputLimits.check(field, Quantity.AIRFLOW, m3PerS, RunCycleAnalysis.MIN_AIRFLOW_M3_PER_S,
                    RunCycleAnalysis.MAX_AIRFLOW_M3_PER_S, null);
            return null;
        } catch (InvalidInputException e) {
            return e;
        }
    }
}
