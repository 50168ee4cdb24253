package app.latentledger.ui.bin;

import app.latentledger.core.records.RecordKind;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.time.OffsetDateTime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Deleting asks first; the bin lists, restores and empties (asked first too). */
class RecycleBinViewModelTest {
    @TempDir
    Path dir;
    Ledger ledger;

    @BeforeEach
    void open() {
        ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO);
    }

    @AfterEach
    void close() {
        ledger.close();
    }

    @Test
    void aDeleteWaitsForYesAndCanBeUndone() {
        int[] changes = {0};
        RecycleBinViewModel vm = new RecycleBinViewModel(ledger, () -> OffsetDateTime.now().plusDays(2));
        vm.onChange(() -> changes[0]++);
        vm.askDelete(RecordKind.READINGS, DemoScenario.READINGS_BEFORE, "the before readings");
        assertTrue(vm.pendingProperty().get().question().contains("can be restored for 30 days"));
        assertTrue(ledger.readings().find(DemoScenario.READINGS_BEFORE).isPresent(), "nothing happens before yes");
        vm.cancelDelete();
        assertFalse(vm.confirmDelete(), "a cancelled question cannot be confirmed");

        vm.askDelete(RecordKind.READINGS, DemoScenario.READINGS_BEFORE, "the before readings");
        assertTrue(vm.confirmDelete());
        assertNull(vm.pendingProperty().get());
        assertTrue(ledger.readings().find(DemoScenario.READINGS_BEFORE).isEmpty());
        assertEquals(1, vm.rows().size());
        assertEquals(27, vm.rows().get(0).daysLeft(), "deleted now, looked at two days on");
        assertEquals(1, changes[0]);

        assertTrue(vm.restore(vm.rows().get(0)));
        assertTrue(ledger.readings().find(DemoScenario.READINGS_BEFORE).isPresent());
        assertTrue(vm.rows().isEmpty());
        assertEquals(2, changes[0]);
    }

    @Test
    void aRefusedRestoreSaysWhyAndKeepsTheEntry() {
        RecycleBinViewModel vm = new RecycleBinViewModel(ledger);
        vm.askDelete(RecordKind.READINGS, DemoScenario.READINGS_AFTER, "the after readings");
        vm.confirmDelete();
        vm.askDelete(RecordKind.VISIT, DemoScenario.VISIT_COMPLAINT, "the complaint visit");
        vm.confirmDelete();
        var readingsRow = vm.rows().stream().filter(r -> r.entry().kind() == RecordKind.READINGS).findFirst().orElseThrow();
        assertFalse(vm.restore(readingsRow));
        assertTrue(vm.messageProperty().get().contains("restore that visit first"), vm.messageProperty().get());
        assertEquals(2, vm.rows().size());
    }

    @Test
    void emptyingIsAskedFirst() {
        RecycleBinViewModel vm = new RecycleBinViewModel(ledger);
        vm.askEmpty();
        assertFalse(vm.emptyAskedProperty().get(), "nothing to empty, nothing to ask");
        vm.askDelete(RecordKind.LOG, "none", "a log");
        assertFalse(vm.confirmDelete());
        assertTrue(vm.messageProperty().get().startsWith("Not deleted"), vm.messageProperty().get());
        vm.askDelete(RecordKind.VISIT, DemoScenario.VISIT_COMMISSIONING, "the commissioning visit");
        vm.confirmDelete();
        assertEquals(0, vm.confirmEmpty(), "not without asking");
        vm.askEmpty();
        assertTrue(vm.emptyAskedProperty().get());
        assertEquals(1, vm.confirmEmpty());
        assertTrue(ledger.recycleBin().list().isEmpty());
        assertEquals("ok", ledger.database().integrityCheck());
    }
}
