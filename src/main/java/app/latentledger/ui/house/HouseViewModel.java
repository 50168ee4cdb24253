package app.latentledger.ui.house;

import app.latentledger.chart.draw.Theme;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.MoistureBudget;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.house.WhatIfRequest;
import app.latentledger.core.text.BalanceWords;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.report.HouseEvidence;
import app.latentledger.report.VisitEvidence;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.chart.CoilCharts;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.util.ArrayList;
import java.util.List;

/**
 * The House screen's state: the open visit's house budget (the same path as {@code house --visit}:
 * {@link HouseEvidence} then {@link MoistureBudget}), the fix candidates as table rows, and storing
 * a house fact or visit reading at once, after which the budget is recomputed. Needs no JavaFX
 * toolkit: observable properties only.
 */
public final class HouseViewModel {
    /**
     * One row of the fix planner table, shown as typed; {@code balance} is the water balance in words
     * ({@link BalanceWords}), the same sentence as the report and the {@code house} command.
     */
    public record FixRow(String key, String change, String balance, String dewPoint, String shr) {
    }

    private final AppSession session;
    private final ReadOnlyObjectWrapper<HouseBudget> budget = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper refusal = new ReadOnlyStringWrapper("");
    /** The chart's palette, following the app's theme (outdoor and dark included) as the other charts do. */
    private final ReadOnlyObjectWrapper<Theme> chartTheme = new ReadOnlyObjectWrapper<>();
    private final HouseEntryViewModel entry;
    /** The open visit's coil checks and analysed logs, read once per visit, units or screen showing. */
    private VisitEvidence evidence;

    public HouseViewModel(AppSession session) {
        this.session = session;
        entry = new HouseEntryViewModel(new HouseEntryViewModel.Source() {
            @Override
            public app.latentledger.core.units.UnitSystem units() {
                return session.units();
            }

            @Override
            public String visitId() {
                return session.visit() == null ? null : session.visit().id();
            }

            @Override
            public app.latentledger.core.records.Site site() {
                return session.visit() == null ? null : session.site();
            }

            @Override
            public app.latentledger.core.settings.InstrumentTolerances tolerances() {
                return session.settings().tolerances();
            }

            @Override
            public java.util.Optional<HouseFacts> facts() {
                return session.visit() == null ? java.util.Optional.empty()
                        : session.ledger().houses().facts(session.visit().siteId());
            }

            @Override
            public HouseVisitReadings readings() {
                return HouseViewModel.this.readings();
            }
        }, this::keep, this::keep, new FileHouseDraftStore(session.dataFolder()));
        session.visitProperty().addListener((o, a, b) -> {
            entry.reset();
            recompute();
        });
        // readings or logs changed on another screen show up when the House screen is opened again
        session.screenProperty().addListener((o, a, b) -> {
            if (b == app.latentledger.ui.session.Screen.HOUSE && a != b) {
                recompute();
            }
        });
        chartTheme.bind(Bindings.createObjectBinding(() -> CoilCharts.theme(session.themeProperty().get()),
                session.themeProperty()));
        session.unitsProperty().addListener((o, a, b) -> {
            recompute();
            entry.refresh();
        });
        recompute();
    }

    /** Typing the house's facts and this visit's house readings on the number pad. */
    public HouseEntryViewModel entry() {
        return entry;
    }

    public ReadOnlyObjectProperty<HouseBudget> budgetProperty() {
        return budget.getReadOnlyProperty();
    }

    /** The palette the budget chart is painted in. */
    public ReadOnlyObjectProperty<Theme> chartThemeProperty() {
        return chartTheme.getReadOnlyProperty();
    }

    /** Why there is no budget yet ("" with one). */
    public ReadOnlyStringProperty refusalProperty() {
        return refusal.getReadOnlyProperty();
    }

    /** Stores the site's house facts at once and recomputes. */
    public void keep(HouseFacts facts) {
        session.ledger().houses().saveFacts(session.visit().siteId(), facts);
        rebudget(facts, readings());
    }

    /** Stores the visit's house readings at once and recomputes. */
    public void keep(HouseVisitReadings readings) {
        session.ledger().houses().saveReadings(session.visit().id(), readings);
        rebudget(session.ledger().houses().facts(session.visit().siteId()).orElse(null), readings);
    }

    /** The units the screen shows. */
    public app.latentledger.core.units.UnitSystem units() {
        return session.units();
    }

    /** The open visit's stored house readings. */
    public HouseVisitReadings readings() {
        return session.visit() == null ? HouseVisitReadings.EMPTY : session.ledger().houses().readings(session.visit().id());
    }

    /**
     * The safety lines that go with the fixes compared (attic heat, mold, combustion appliances when
     * a fix changes house pressure, licensed practice); empty without a budget.
     */
    public List<String> cautions() {
        HouseBudget b = budget.get();
        return b == null ? List.of() : b.cautions();
    }

    /** The fix planner as table rows: as found first, then each candidate. */
    public List<FixRow> fixRows() {
        HouseBudget b = budget.get();
        List<FixRow> rows = new ArrayList<>();
        if (b == null) {
            return rows;
        }
        rows.add(row(b.asFound()));
        b.whatIfs().forEach(w -> rows.add(row(w)));
        return rows;
    }

    private FixRow row(ScenarioResult s) {
        var u = session.units();
        return new FixRow(s.scenario().key(), s.scenario().change(),
                BalanceWords.sentence(u, s.balance().valueSi(), s.balance().expandedSi()),
                s.hasEquilibrium() ? "indoor dew point settles at " + DisplayNumber.withSpread(Quantity.TEMPERATURE, u,
                        s.equilibriumDewPointC().valueSi(), s.equilibriumDewPointC().expandedSi())
                        : "indoor humidity keeps rising (no level where it settles)",
                DisplayNumber.number(s.shr().valueSi(), 3));
    }

    /**
     * Recomputes the budget of the open visit from what is stored, reading its coil checks and logs
     * again (another screen may have changed them).
     */
    public void recompute() {
        if (session.visit() == null) {
            evidence = null;
            budget.set(null);
            refusal.set("open a visit first");
            return;
        }
        evidence = VisitEvidence.load(session.ledger(), session.visit().id(), session.units());
        apply(HouseEvidence.of(session.ledger(), evidence, session.thresholds(), Double.NaN));
    }

    /**
     * After a keypad entry: the budget and every fix again from the house's facts and readings just
     * stored, on the coil checks and logs already read — the path the budget benchmark times.
     */
    private void rebudget(HouseFacts facts, HouseVisitReadings readings) {
        if (evidence == null || !evidence.visit().id().equals(session.visit().id())) {
            recompute();
            return;
        }
        apply(HouseEvidence.of(facts, readings, evidence, session.thresholds(), Double.NaN));
    }

    private void apply(HouseEvidence e) {
        if (!e.ready()) {
            budget.set(null);
            refusal.set(e.refusal());
            return;
        }
        budget.set(MoistureBudget.compute(e.inputs(), WhatIfRequest.DEFAULTS, session.units()));
        refusal.set("");
    }
}
