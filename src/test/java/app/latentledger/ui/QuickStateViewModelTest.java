package app.latentledger.ui;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The quick-check screen's state, without a window. */
class QuickStateViewModelTest {

    /** 80/67 °F at sea level: dew point 60.3 °F, 51.1 % RH, 78.2 gr/lb (domain-practice.md App. A, [DER]). */
    @Test
    void showsTheRatingPointState() {
        QuickStateViewModel vm = new QuickStateViewModel();
        assertTrue(vm.resultProperty().get().contains("Dew point 60.3 °F"), vm.resultProperty().get());
        assertTrue(vm.resultProperty().get().contains("78.2 gr/lb"));
        assertEquals("", vm.problemProperty().get());
    }

    @Test
    void refusesAWetBulbAboveTheDryBulbAndSaysWhy() {
        QuickStateViewModel vm = new QuickStateViewModel();
        vm.wetBulbProperty().set("85");
        assertEquals("", vm.resultProperty().get());
        assertTrue(vm.problemProperty().get().startsWith("wet bulb 85 °F refused"), vm.problemProperty().get());
        vm.wetBulbProperty().set("67");
        assertEquals("", vm.problemProperty().get());
    }

    @Test
    void refusesTextThatIsNotANumber() {
        QuickStateViewModel vm = new QuickStateViewModel();
        vm.dryBulbProperty().set("8o");
        assertTrue(vm.problemProperty().get().contains("dry bulb '8o' is not a number"));
    }
}
