package app.latentledger.report;

import app.latentledger.core.findings.Evidence;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.UnitSystem;

/** A finding's evidence as one line: "label: value ± U unit". */
final class EvidenceText {
    private EvidenceText() {
    }

    static String of(Evidence e, UnitSystem units) {
        return e.label() + ": " + DisplayNumber.withSpread(e.quantity(), units, e.valueSi(), e.uncertaintySi());
    }
}
