package app.latentledger.core.house;

/**
 * Fixes the tech asked to see, SI; NaN lets the planner pick its usual candidate.
 *
 * @param airflowM3PerS     total blower airflow to try, m³/s
 * @param ach50             envelope tightness to try, air changes per hour at 50 Pa
 * @param ventilationM3PerS ventilation airflow to try, m³/s
 */
public record WhatIfRequest(double airflowM3PerS, double ach50, double ventilationM3PerS) {
    /** Nothing asked: the planner's own candidates. */
    public static final WhatIfRequest DEFAULTS = new WhatIfRequest(Double.NaN, Double.NaN, Double.NaN);
}
