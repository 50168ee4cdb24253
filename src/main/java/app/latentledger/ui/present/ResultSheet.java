package app.latentledger.ui.present;

import app.latentledger.core.coil.CoilVerdict;

import java.util.List;

/**
 * Everything the results screen shows for one draft, already worded. Built by {@link VisitResults};
 * the views only put it on the screen.
 *
 * @param verdict      the coil check's answer, or null while the readings are incomplete or refused
 * @param headline     the answer in words ("Dehumidifying", …) or what is missing
 * @param explanation  one sentence behind the headline
 * @param entering     return (coil-entering) state rows
 * @param leaving      supply (coil-leaving) state rows
 * @param performance  capacities, SHR, moisture removal, margins
 * @param findings     the findings, in the core's order
 * @param safety       the safety line that ends every findings list
 * @param marginWords  the dew-point margin as a sentence ("Coil is 3.2 ± 2.3 °F warmer than the return
 *                     dew point — it cannot dry the air"), "" while there is no check
 */
public record ResultSheet(CoilVerdict verdict, String headline, String explanation, List<Row> entering,
                          List<Row> leaving, List<Row> performance, List<FindingCard> findings, String safety,
                          String marginWords) {
    public ResultSheet {
        entering = List.copyOf(entering);
        leaving = List.copyOf(leaving);
        performance = List.copyOf(performance);
        findings = List.copyOf(findings);
    }

    /** The verdict's key ("dehumidifying", "not-dehumidifying", "cant-tell") or "incomplete". */
    public String verdictKey() {
        return verdict == null ? "incomplete" : verdict.key();
    }

    /** The row with {@code key} among the performance rows, or null. */
    public Row performance(String key) {
        return performance.stream().filter(r -> r.key().equals(key)).findFirst().orElse(null);
    }
}
