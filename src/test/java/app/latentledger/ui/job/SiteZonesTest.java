package app.latentledger.ui.job;

import app.latentledger.core.records.SiteTimeZone;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The zones the site form offers and finds. */
class SiteZonesTest {
    @Test
    void everyUsualZoneIsOneASiteAcceptsAndTheTabletsComesFirst() {
        List<SiteZones.Choice> common = SiteZones.common();
        assertEquals(SiteZones.TABLET, common.get(0));
        for (SiteZones.Choice c : common.subList(1, common.size())) {
            assertEquals(c.id(), SiteTimeZone.check("site time zone", c.id()), c.label());
            assertTrue(c.label().endsWith(c.id()), "the id is shown with its name: " + c.label());
        }
    }

    @Test
    void searchingFindsByNameByCityWithSpacesAndByIdAndKeepsTheChoiceMade() {
        SiteZones.Choice lisbon = SiteZones.of("Europe/Lisbon");
        List<SiteZones.Choice> saskatchewan = SiteZones.search("saskatchewan", null);
        assertTrue(saskatchewan.contains(SiteZones.of("America/Regina")), saskatchewan.toString());
        assertTrue(SiteZones.search("los angeles", null).contains(SiteZones.of("America/Los_Angeles")));
        List<SiteZones.Choice> found = SiteZones.search("Europe/Lis", SiteZones.of("America/Denver"));
        assertEquals(List.of(SiteZones.TABLET, SiteZones.of("America/Denver"), lisbon), found);
        assertEquals("Europe/Lisbon", lisbon.label(), "a zone without a usual name shows its id");
        assertTrue(SiteZones.search("america", null).size() <= 2 + SiteZones.common().size() + SiteZones.MAX_FOUND);
        assertEquals(SiteZones.common(), SiteZones.search("  ", SiteZones.TABLET));
    }
}
