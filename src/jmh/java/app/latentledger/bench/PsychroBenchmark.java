package app.latentledger.bench;

import app.latentledger.core.psychro.HandbookEdition;
import app.latentledger.core.psychro.MoistAirState;
import app.latentledger.core.psychro.Psychrometrics;
import com.synerset.hvacengine.fluids.humidair.HumidAir;
import com.synerset.unitility.unitsystem.humidity.RelativeHumidity;
import com.synerset.unitility.unitsystem.thermodynamic.Pressure;
import com.synerset.unitility.unitsystem.thermodynamic.Temperature;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

/**
 * Cost of one full moist-air state (every property, wet bulb converged to 1e-9 K) from the
 * readings a tech types, against hvac-engine 1.2.0 doing the same job in the same JVM. Inputs
 * cycle through 1024 realistic field readings so no result can be folded into a constant.
 *
 * <p>Run: {@code mvn -B -Pjmh test-compile exec:exec -Djmh.include=PsychroBenchmark}
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class PsychroBenchmark {
    private static final int N = 1024;
    private final double[] dryBulbC = new double[N];
    private final double[] rhPct = new double[N];
    private final double[] wetBulbC = new double[N];
    private final double[] humidityRatio = new double[N];
    private final double pressurePa = 101_325;
    private int i;

    @Setup
    public void setUp() {
        SplittableRandom random = new SplittableRandom(7);
        for (int k = 0; k < N; k++) {
            dryBulbC[k] = 10 + 30 * random.nextDouble();
            rhPct[k] = 20 + 75 * random.nextDouble();
            MoistAirState s = MoistAirState.fromRelativeHumidity(pressurePa, dryBulbC[k], rhPct[k], HandbookEdition.SI);
            wetBulbC[k] = s.wetBulbC();
            humidityRatio[k] = s.humidityRatio();
        }
    }

    private int next() {
        i = (i + 1) & (N - 1);
        return i;
    }

    @Benchmark
    public MoistAirState stateFromDryBulbAndRh() {
        int k = next();
        return MoistAirState.fromRelativeHumidity(pressurePa, dryBulbC[k], rhPct[k], HandbookEdition.SI);
    }

    @Benchmark
    public MoistAirState stateFromDryBulbAndWetBulb() {
        int k = next();
        return MoistAirState.fromWetBulb(pressurePa, dryBulbC[k], wetBulbC[k], HandbookEdition.SI);
    }

    @Benchmark
    public double dewPointFromHumidityRatio() {
        return Psychrometrics.dewPointC(humidityRatio[next()], pressurePa);
    }

    /** The reference: hvac-engine's full state from (db, RH), reading every property we compute. */
    @Benchmark
    public void hvacEngineStateFromDryBulbAndRh(Blackhole bh) {
        int k = next();
        HumidAir air = HumidAir.of(Pressure.ofPascal(pressurePa), Temperature.ofCelsius(dryBulbC[k]),
                RelativeHumidity.ofPercentage(rhPct[k]));
        bh.consume(air.getWetBulbTemperature());
        bh.consume(air.getDewPointTemperature());
        bh.consume(air.getHumidityRatio());
        bh.consume(air.getSpecificEnthalpy());
        bh.consume(air.getDensity());
    }
}
