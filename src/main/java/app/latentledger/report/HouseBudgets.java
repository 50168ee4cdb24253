package app.latentledger.report;

import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.MoistureBudget;
import app.latentledger.core.house.WhatIfRequest;
import app.latentledger.store.Ledger;

/** The report's house budget: the latest visit's, with the tech's stored thresholds, or null without one. */
final class HouseBudgets {
    private HouseBudgets() {
    }

    static HouseBudget of(Ledger ledger, ReportData data) {
        HouseEvidence e = HouseEvidence.of(ledger, data.latest(), ledger.settings().load().thresholds(), Double.NaN);
        return e.ready() ? MoistureBudget.compute(e.inputs(), WhatIfRequest.DEFAULTS, data.units()) : null;
    }
}
