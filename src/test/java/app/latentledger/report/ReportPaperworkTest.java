package app.latentledger.report;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.SignOff;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.core.settings.PaperSize;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** The report prints the visit's paperwork, system details, instruments and sign-offs as recorded. */
class ReportPaperworkTest {
    @TempDir
    Path dir;

    @Test
    void paperworkInstrumentsAndSignOffsArePrinted() throws Exception {
        Path out = dir.resolve("report.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            HvacSystem s = ledger.systems().find(DemoScenario.SYSTEM_HERON).orElseThrow();
            ledger.systems().save(new HvacSystem(s.id(), s.siteId(), s.label(), s.type(), s.nominalCapacityW(),
                    s.refrigerant(), s.blowerType(), s.fanSetting(), s.thermostatNotes(), "TXV", "20x25x1 pleated, clogged"));
            ledger.instruments().save(new Instrument("probe-a", DemoScenario.VISIT_COMPLAINT, "Probe kit A", "SR-1001",
                    LocalDate.of(2024, 3, 2), new StatedAccuracy(0.3, 2.0, null, null, null, null)));
            ledger.instruments().useOn(DemoScenario.READINGS_BEFORE, List.of("probe-a"));
            OffsetDateTime at = OffsetDateTime.parse("2024-07-16T11:30:00-04:00");
            ledger.paperwork().save(new VisitPaperwork(DemoScenario.VISIT_COMPLAINT, "Windows sweat every morning",
                    "Cleaned the coil and slowed the blower", new SignOff("Rowan Teale", at, "cert 12-345"),
                    new SignOff("Ada Marsh", at.plusMinutes(4), "wants a follow-up in August")));
            VisitReport.write(ledger, DemoScenario.VISIT_COMPLAINT, null, PaperSize.LETTER, UnitSystem.IP, out);
        }
        try (PDDocument doc = ReportPdfs.open(out)) {
            String text = ReportPdfs.text(doc).replaceAll("\\s+", " ");
            for (String expected : List.of("Windows sweat every morning", "Cleaned the coil and slowed the blower",
                    "Metering device: TXV", "Filter: 20x25x1 pleated, clogged", "Probe kit A, s/n SR-1001, calibrated 2024-03-02",
                    "dry bulb ±" + DisplayNumber.withUnit(Quantity.TEMPERATURE_DIFFERENCE, UnitSystem.IP, 0.3),
                    "RH ±2.0 %", "used for: Before", "Ada Marsh", "Signed on the tablet 16 July 2024",
                    "Technician's remark: cert 12-345", "Customer's remark: wants a follow-up in August")) {
                assertTrue(text.contains(expected), "report holds: " + expected);
            }
        }
    }

    @Test
    void aVisitWithoutPaperworkSaysSo() throws Exception {
        Path out = dir.resolve("bare.pdf");
        try (Ledger ledger = Ledger.open(dir.resolve("data"), Ledger.FirstRun.SEED_DEMO)) {
            VisitReport.write(ledger, DemoScenario.VISIT_COMMISSIONING, null, PaperSize.A4, UnitSystem.SI, out);
        }
        try (PDDocument doc = ReportPdfs.open(out)) {
            String text = ReportPdfs.text(doc).replaceAll("\\s+", " ");
            assertTrue(text.contains("Customer's words: not written down"), text);
            assertTrue(text.contains("No instruments were recorded on this visit"), text);
            assertTrue(text.contains("Metering device: not recorded"), text);
        }
    }
}
