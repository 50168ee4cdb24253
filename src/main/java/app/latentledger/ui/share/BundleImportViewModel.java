package app.latentledger.ui.share;

import app.latentledger.bundle.BundleException;
import app.latentledger.bundle.Bundles;
import app.latentledger.store.Ledger;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import java.nio.file.Path;
import java.util.concurrent.Executor;

/**
 * Importing a bundle in the app: pick the file, read and check it and show what it would add,
 * leave and delete, and only on the tech's yes change the ledger. Reading and importing run off
 * the FX thread.
 */
public final class BundleImportViewModel {
    private final Ledger ledger;
    private final Executor work;
    private final Executor fx;
    private final ReadOnlyObjectWrapper<Path> file = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper preview = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper canImport = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(false);
    private Runnable afterImport = () -> { };

    public BundleImportViewModel(Ledger ledger, Executor work, Executor fx) {
        this.ledger = ledger;
        this.work = work;
        this.fx = fx;
    }

    /** Called after an import changed the ledger, so the screens reload. */
    public void onImported(Runnable afterImport) {
        this.afterImport = afterImport == null ? () -> { } : afterImport;
    }

    /** The file picked: read and checked, nothing changed yet. */
    public void choose(Path chosen) {
        file.set(chosen);
        canImport.set(false);
        preview.set("");
        message.set(chosen == null ? "" : "Reading " + chosen.getFileName() + " …");
        if (chosen == null) {
            return;
        }
        busy.set(true);
        work.execute(() -> {
            String text;
            boolean ok;
            try {
                Bundles.ImportSummary s = Bundles.preview(ledger, chosen);
                ok = s.conflicts().isEmpty();
                text = s.plainWords();
            } catch (BundleException e) {
                ok = false;
                text = e.getMessage();
            }
            boolean importable = ok;
            String shown = text;
            fx.execute(() -> {
                busy.set(false);
                preview.set(shown);
                canImport.set(importable);
                message.set(importable ? "Import it?" : "Nothing was imported.");
            });
        });
    }

    /** The tech said yes. */
    public void confirm() {
        Path f = file.get();
        if (f == null || !canImport.get()) {
            return;
        }
        canImport.set(false);
        busy.set(true);
        work.execute(() -> {
            String text;
            boolean changed;
            try {
                Bundles.ImportSummary s = Bundles.importBundle(ledger, f);
                text = "Imported " + f.getFileName() + ": " + s.added() + " records added"
                        + (s.deleted() > 0 ? ", " + s.deleted() + " moved to the recycle bin" : "") + ".";
                changed = s.added() > 0 || s.deleted() > 0;
            } catch (BundleException e) {
                text = e.getMessage();
                changed = false;
            }
            String shown = text;
            boolean reload = changed;
            fx.execute(() -> {
                busy.set(false);
                message.set(shown);
                preview.set("");
                file.set(null);
                if (reload) {
                    afterImport.run();
                }
            });
        });
    }

    public void cancel() {
        file.set(null);
        preview.set("");
        canImport.set(false);
        message.set("Nothing was imported.");
    }

    public ReadOnlyObjectProperty<Path> fileProperty() {
        return file.getReadOnlyProperty();
    }

    /** What the import would do, in words. */
    public ReadOnlyStringProperty previewProperty() {
        return preview.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canImportProperty() {
        return canImport.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty busyProperty() {
        return busy.getReadOnlyProperty();
    }
}
