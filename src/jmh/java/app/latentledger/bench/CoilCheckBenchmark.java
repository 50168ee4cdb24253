package app.latentledger.bench;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilModel;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.coil.OutdoorAir;
import app.latentledger.core.coil.Propagation;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.units.UnitSystem;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

import java.util.concurrent.TimeUnit;

/**
 * Cost of one coil check (states, ADP, first-order uncertainty over 8 inputs = 17 model
 * evaluations, findings) against the reference of one moist-air state from dry bulb and RH, in
 * the same process; and a 2000-draw Monte Carlo of the same readings. Case A readings with a coil
 * probe, and with 20 % outdoor air mixed in. Target (PROPOSAL): a coil check well under 1 ms so the tablet recomputes on every keypress.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class CoilCheckBenchmark {
    private final CoilReadings readings = new CoilReadings(101_325,
            new AirReading("return", 23.8889, 0.2778, HumidityKind.RELATIVE_HUMIDITY, 50, 2),
            new AirReading("supply", 12.7778, 0.2778, HumidityKind.RELATIVE_HUMIDITY, 90, 2),
            0.5663, 0.10, AirflowPoint.ENTERING, 7.2, 0.5556,
            app.latentledger.core.measure.CoilTemperatureKind.COIL_SURFACE, 10_550, null);
    /** The same readings with 20 % outdoor air at 92 °F db / 77 °F wb: 11 inputs, 23 evaluations plus the mix. */
    private final CoilReadings mixedReadings = readings.withOutdoor(new OutdoorAir(
            new AirReading("outdoor", 33.3333, 0.2778, HumidityKind.WET_BULB, 25.0, 0.2778), 0.20, 0.05));
    private final CoilModel model = new CoilModel(readings);

    @Benchmark
    public MoistAirState referenceStateFromRh() {
        return MoistAirState.fromRelativeHumidity(101_325, 23.8889, 50, HandbookEdition.SI);
    }

    @Benchmark
    public CoilResult coilCheck() {
        return CoilCheck.run(readings, ThresholdSettings.DEFAULTS, UnitSystem.IP);
    }

    @Benchmark
    public CoilResult coilCheckWithOutdoorAir() {
        return CoilCheck.run(mixedReadings, ThresholdSettings.DEFAULTS, UnitSystem.IP);
    }

    @Benchmark
    public Propagation.Result monteCarlo2000() {
        return Propagation.monteCarlo(model.inputs(), model, 2000, 1);
    }
}
