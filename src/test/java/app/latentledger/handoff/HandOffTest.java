package app.latentledger.handoff;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Handing a report on: only what the device offers, each to the right place, refusals said plainly. */
class HandOffTest {
    @TempDir
    Path dir;

    /** A desktop that records what it was asked to do. */
    private static final class FakeDesktop implements DesktopHandOff.Actions {
        final Set<HandOff.Action> offered;
        final List<String> done = new ArrayList<>();

        FakeDesktop(Set<HandOff.Action> offered) {
            this.offered = offered;
        }

        @Override
        public boolean supports(HandOff.Action action) {
            return offered.contains(action);
        }

        @Override
        public void open(Path file) {
            done.add("open " + file.getFileName());
        }

        @Override
        public void print(Path file) {
            done.add("print " + file.getFileName());
        }
    }

    @Test
    void theDesktopOpensAndPrintsWhatItSupports() throws Exception {
        Path pdf = Files.writeString(dir.resolve("report.pdf"), "%PDF-1.7");
        FakeDesktop desktop = new FakeDesktop(EnumSet.of(HandOff.Action.OPEN));
        HandOffs device = new HandOffs(List.of(new DesktopHandOff(desktop)));
        assertEquals(EnumSet.of(HandOff.Action.OPEN), device.available());
        device.run(HandOff.Action.OPEN, pdf, "Report");
        assertEquals(List.of("open report.pdf"), desktop.done);
        IOException e = assertThrows(IOException.class, () -> device.run(HandOff.Action.PRINT, pdf, "Report"));
        assertTrue(e.getMessage().contains("cannot print"), e.getMessage());
        assertTrue(e.getMessage().contains("report.pdf"), "says where the file is: " + e.getMessage());
    }

    @Test
    void aMissingFileIsRefusedBeforeTheDesktopIsAsked() {
        FakeDesktop desktop = new FakeDesktop(EnumSet.of(HandOff.Action.OPEN, HandOff.Action.PRINT));
        DesktopHandOff d = new DesktopHandOff(desktop);
        assertThrows(IOException.class, () -> d.run(HandOff.Action.PRINT, dir.resolve("gone.pdf"), "Report"));
        assertTrue(desktop.done.isEmpty());
    }

    @Test
    void withoutTheShareServiceNoShareIsOffered() {
        // the desktop build carries no Attach share implementation
        assertTrue(AttachShare.find().isEmpty());
        assertTrue(AttachShare.find("no.such.Service").isEmpty());
        assertTrue(!HandOffs.forThisDevice().available().contains(HandOff.Action.SHARE));
    }

    @Test
    void headlessTestsOfferNothingFromTheRealDesktop() {
        // surefire runs with java.awt.headless=true: no viewer could appear, so none is offered
        org.junit.jupiter.api.Assumptions.assumeTrue(java.awt.GraphicsEnvironment.isHeadless());
        assertEquals(Set.of(), DesktopHandOff.system().available());
    }
}
