package app.latentledger.core.cycles;

import app.latentledger.core.psychro.SaturationPressure;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The memo returns exactly what {@link SaturationPressure#pascals} returns for the same input
 * (ASHRAE Handbook—Fundamentals 2017 ch. 1 eqs. 5–6, checked against the Handbook's table in the
 * psychro tests): many values, asked for in any order and again, more than the memo has slots so
 * that slots are overwritten, and values one ulp apart.
 */
class SaturationMemoTest {
    @Property(tries = 50)
    void sameBitsAsTheFormula(@ForAll @Size(min = 1, max = 6000) List<@DoubleRange(min = -50, max = 95) Double> temps) {
        SaturationMemo memo = new SaturationMemo();
        for (int pass = 0; pass < 2; pass++) {
            for (double t : temps) {
                assertEquals(Double.doubleToLongBits(SaturationPressure.pascals(t)), Double.doubleToLongBits(memo.pascals(t)));
                double next = Math.nextUp(t);
                assertEquals(Double.doubleToLongBits(SaturationPressure.pascals(next)),
                        Double.doubleToLongBits(memo.pascals(next)));
            }
        }
    }
}
