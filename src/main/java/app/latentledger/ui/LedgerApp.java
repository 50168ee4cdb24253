package app.latentledger.ui;

import javafx.application.Application;
import javafx.scene.Scene;
import javafx.stage.Stage;

/**
 * The tablet app. Its first screen is a quick moist-air check from dry bulb and wet bulb; the
 * visit flow builds on it.
 */
public final class LedgerApp extends Application {
    /** Called from the plain {@code Main} so a class-path launch finds the JavaFX runtime. */
    public static void launchWith(String[] args) {
        Application.launch(LedgerApp.class, args);
    }

    @Override
    public void start(Stage stage) {
        stage.setTitle("Latent Ledger");
        stage.setScene(createScene(new QuickStateViewModel()));
        stage.show();
    }

    /** The quick-check screen at the tablet's 1280×800 landscape size. */
    public static Scene createScene(QuickStateViewModel vm) {
        return new Scene(new QuickStateView(vm), 1280, 800);
    }
}
