package app.latentledger.bench;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.house.HouseBudget;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseInputs;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.MoistureBudget;
import app.latentledger.core.house.ScenarioResult;
import app.latentledger.core.house.WhatIfRequest;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.report.HouseEvidence;
import app.latentledger.report.VisitEvidence;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/**
 * What one keypad entry on the House screen costs, on the demo house (Heron Spit Road): a new outdoor
 * dew point each time (74 / 75 °F), then
 * <ul>
 * <li>{@code recompute}: the whole budget with its uncertainty, every fix re-solved with its
 *     uncertainty, the dehumidifier sizing and the findings — the target is 5 ms;</li>
 * <li>{@code asFoundOnly}: the budget as found, with its uncertainty;</li>
 * <li>{@code referenceState}: one moist-air state from dry bulb and RH, for ratios in the same process.</li>
 * </ul>
 * The stored inputs are read once (setup); the benchmark measures the calculation.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class HouseBudgetBenchmark {
    private HouseInputs base;
    private AirReading[] outdoor;
    private int n;

    @Setup(Level.Trial)
    public void open() throws Exception {
        Path dir = Files.createTempDirectory("house-bench");
        try (Ledger ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO)) {
            VisitEvidence ev = VisitEvidence.load(ledger, DemoScenario.VISIT_COMPLAINT, UnitSystem.IP);
            base = HouseEvidence.of(ledger, ev, ThresholdSettings.DEFAULTS, Double.NaN).inputs();
        }
        AirReading o = base.readings().outdoor();
        outdoor = new AirReading[] {o, new AirReading(o.where(), o.dryBulbC(), o.dryBulbTolK(), o.humidityKind(),
                o.humiditySi() + 1 / 1.8, o.humidityTolSi())};
    }

    private HouseInputs entered() {
        AirReading o = outdoor[n++ & 1];
        HouseFacts f = base.facts();
        var r = base.readings();
        HouseVisitReadings v = new HouseVisitReadings(o, r.grille(), r.plenum(), r.space(), Double.NaN);
        return new HouseInputs(f, v.forBudget(r.indoor()), base.system(), base.pressurePa(), base.thresholds());
    }

    @Benchmark
    public MoistAirState referenceState() {
        return MoistAirState.fromRelativeHumidity(101_325, 23.8889, 50, HandbookEdition.SI);
    }

    @Benchmark
    public HouseBudget recompute() {
        return MoistureBudget.compute(entered(), WhatIfRequest.DEFAULTS, UnitSystem.IP);
    }

    @Benchmark
    public ScenarioResult asFoundOnly() {
        return MoistureBudget.asFound(entered());
    }
}
