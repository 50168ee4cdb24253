package app.latentledger.core.settings;

import org.junit.jupiter.api.Test;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** The methods document lists every setting, so a threshold added to the catalogue is documented. */
class SettingsDocsTest {
    @Test
    void methodsDocumentNamesEveryKey() throws Exception {
        String doc = Files.readString(Path.of("docs/methods.md"));
        for (String key : SettingsCatalogue.keys()) {
            assertTrue(doc.contains("| `" + key + "` |"), key + " missing from docs/methods.md");
        }
    }
}
