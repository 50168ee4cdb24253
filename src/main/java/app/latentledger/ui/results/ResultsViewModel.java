package app.latentledger.ui.results;

import app.latentledger.ui.AppSession;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;

/**
 * The results screen: the sheet of the draft being entered, recomputed whenever an accepted value
 * changes the draft or the system (its nominal size).
 */
public final class ResultsViewModel {
    private final AppSession session;
    private final ReadOnlyObjectWrapper<ResultSheet> sheet = new ReadOnlyObjectWrapper<>();

    public ResultsViewModel(AppSession session) {
        this.session = session;
        session.draftProperty().addListener((o, a, b) -> recompute());
        session.systemProperty().addListener((o, a, b) -> recompute());
        recompute();
    }

    public ReadOnlyObjectProperty<ResultSheet> sheetProperty() {
        return sheet.getReadOnlyProperty();
    }

    public ResultSheet sheet() {
        return sheet.get();
    }

    private void recompute() {
        if (session.draft() == null || session.system() == null) {
            return;
        }
        sheet.set(VisitResults.of(session.draft(), session.site(), session.system(), session.thresholds(),
                session.units()));
    }
}
