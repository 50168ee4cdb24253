package app.latentledger.ui.share;

import app.latentledger.bundle.Bundles;
import app.latentledger.handoff.HandOff;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Executor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The report's open/print/share buttons and the in-app bundle import with its preview. */
class ShareAndImportViewModelsTest {
    private static final Executor NOW = Runnable::run;

    @TempDir
    Path dir;

    private static final class Recorder implements HandOff {
        final Set<Action> offered;
        final List<String> done = new ArrayList<>();

        Recorder(Set<Action> offered) {
            this.offered = offered;
        }

        @Override
        public Set<Action> available() {
            return offered;
        }

        @Override
        public void run(Action action, Path file, String title) throws IOException {
            if (file.getFileName().toString().startsWith("locked")) {
                throw new IOException("the viewer refused it");
            }
            done.add(action + " " + file.getFileName() + " " + title);
        }
    }

    @Test
    void onlyTheOfferedButtonsWorkAndOnlyWithAFile() throws Exception {
        Recorder device = new Recorder(EnumSet.of(HandOff.Action.OPEN, HandOff.Action.SHARE));
        ShareViewModel vm = new ShareViewModel(device, NOW, NOW);
        assertFalse(vm.canOpenProperty().get(), "no file yet");
        Path pdf = Files.writeString(dir.resolve("report.pdf"), "%PDF");
        vm.fileProperty().set(pdf);
        vm.titleProperty().set("Report, Heron Spit Road");
        assertTrue(vm.canOpenProperty().get());
        assertTrue(vm.canShareProperty().get());
        assertFalse(vm.canPrintProperty().get());
        vm.open();
        vm.print(); // not offered: nothing happens
        vm.share();
        assertEquals(List.of("OPEN report.pdf Report, Heron Spit Road", "SHARE report.pdf Report, Heron Spit Road"),
                device.done);
        assertEquals("Shared report.pdf.", vm.messageProperty().get());
        vm.fileProperty().set(dir.resolve("locked.pdf"));
        vm.open();
        assertTrue(vm.messageProperty().get().contains("the viewer refused it"), vm.messageProperty().get());
        assertTrue(new ShareViewModel(new Recorder(Set.of()), NOW, NOW).offersNothing());
    }

    @Test
    void aBundleIsPreviewedBeforeAnythingChanges() throws Exception {
        Path bundle = dir.resolve("visit.zip");
        try (Ledger source = Ledger.open(dir.resolve("source"), Ledger.FirstRun.SEED_DEMO)) {
            Bundles.exportVisit(source, DemoScenario.VISIT_COMPLAINT, bundle);
        }
        try (Ledger target = Ledger.open(dir.resolve("target"), Ledger.FirstRun.SEED_DEMO)) {
            // the target has the demo too: delete the visit so the bundle brings it back
            target.recycleBin().delete(app.latentledger.core.records.RecordKind.VISIT, DemoScenario.VISIT_COMPLAINT);
            target.recycleBin().empty();
            BundleImportViewModel vm = new BundleImportViewModel(target, NOW, NOW);
            int[] reloads = {0};
            vm.onImported(() -> reloads[0]++);
            vm.choose(bundle);
            assertTrue(vm.previewProperty().get().startsWith("Adds 1 visit, 2 reading sets"), vm.previewProperty().get());
            assertTrue(vm.canImportProperty().get());
            assertTrue(target.visits().find(DemoScenario.VISIT_COMPLAINT).isEmpty(), "nothing changed by the preview");
            vm.confirm();
            assertTrue(target.visits().find(DemoScenario.VISIT_COMPLAINT).isPresent());
            assertTrue(vm.messageProperty().get().startsWith("Imported visit.zip"), vm.messageProperty().get());
            assertEquals(1, reloads[0]);

            Path broken = Files.write(dir.resolve("broken.zip"), new byte[] {1, 2, 3});
            vm.choose(broken);
            assertFalse(vm.canImportProperty().get());
            assertTrue(vm.previewProperty().get().contains("not a complete zip"), vm.previewProperty().get());
            vm.confirm();
            assertEquals(1, reloads[0]);
        }
    }
}
