package app.latentledger.ui.settings;

import app.latentledger.store.Ledger;
import app.latentledger.sync.OfficeSync;
import app.latentledger.sync.StubOffice;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.List;
import java.util.concurrent.Executor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Settings → Office without a window: the work is queued off the caller and run when the test says. */
class OfficeViewModelTest {
    @TempDir
    Path dir;
    StubOffice office;
    Ledger ledger;
    final ArrayDeque<Runnable> queued = new ArrayDeque<>();
    final Executor work = queued::add;
    final Executor fx = Runnable::run;

    @BeforeEach
    void start() throws Exception {
        office = new StubOffice();
        ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO);
    }

    @AfterEach
    void stop() {
        ledger.close();
        office.close();
        assertEquals(List.of(), office.violations);
    }

    private void runQueued() {
        while (!queued.isEmpty()) {
            queued.poll().run();
        }
    }

    @Test
    void enrolAndSyncRunOffTheCallersThreadAndShowWhatIsWaiting() {
        OfficeViewModel vm = new OfficeViewModel(() -> new OfficeSync(ledger), work, fx);
        runQueued();
        assertFalse(vm.enrolledProperty().get());
        assertTrue(vm.officeProperty().get().startsWith("Not enrolled"), vm.officeProperty().get());
        assertTrue(vm.waitingProperty().get().endsWith("waiting to go to the office."), vm.waitingProperty().get());

        vm.serverProperty().set(office.url());
        vm.codeProperty().set(office.newCode());
        vm.enrol();
        assertTrue(vm.busyProperty().get(), "the office is asked on the worker, not here");
        assertFalse(vm.enrolledProperty().get());
        runQueued();
        assertTrue(vm.enrolledProperty().get());
        assertFalse(vm.busyProperty().get());
        assertTrue(vm.officeProperty().get().startsWith(StubOffice.COMPANY + " at " + office.url()), vm.officeProperty().get());
        assertEquals("", vm.codeProperty().get(), "a used code is cleared");

        vm.syncNow();
        assertEquals("Syncing with the office …", vm.messageProperty().get());
        runQueued();
        assertEquals("Nothing is waiting to go.", vm.waitingProperty().get());
        assertTrue(vm.messageProperty().get().startsWith("Sent "), vm.messageProperty().get());
        assertTrue(vm.lastSyncProperty().get().startsWith("Last sync "), vm.lastSyncProperty().get());
        assertTrue(vm.lastSyncProperty().get().contains(", done: Sent"), vm.lastSyncProperty().get());
    }

    @Test
    void withNoNetworkTheMessageIsPlainAndNothingIsLost() throws Exception {
        OfficeViewModel vm = new OfficeViewModel(() -> new OfficeSync(ledger), work, fx);
        vm.serverProperty().set(office.url());
        vm.codeProperty().set(office.newCode());
        vm.enrol();
        runQueued();
        String waiting = vm.waitingProperty().get();
        office.close();
        vm.syncNow();
        runQueued();
        assertTrue(vm.messageProperty().get().startsWith("Cannot reach the office server at " + office.url()),
                vm.messageProperty().get());
        assertEquals(waiting, vm.waitingProperty().get());
        assertTrue(vm.lastSyncProperty().get().contains("did not finish"), vm.lastSyncProperty().get());
        assertFalse(vm.busyProperty().get());
        office = new StubOffice();
    }

    @Test
    void aBadAddressIsRefusedPlainly() {
        OfficeViewModel vm = new OfficeViewModel(() -> new OfficeSync(ledger), work, fx);
        vm.serverProperty().set("office.saltreed");
        vm.codeProperty().set("SALT-0001-REED");
        vm.enrol();
        runQueued();
        assertTrue(vm.messageProperty().get().startsWith("Server address 'office.saltreed' refused"),
                vm.messageProperty().get());
        assertFalse(vm.enrolledProperty().get());
    }
}
