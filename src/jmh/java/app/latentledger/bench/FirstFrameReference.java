package app.latentledger.bench;

import javafx.animation.AnimationTimer;
import javafx.application.Application;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.stage.Stage;

import java.lang.management.ManagementFactory;

/**
 * Reference for the app's first-frame time: a bare JavaFX window with one label, launched the same
 * way (class path, same JVM flags), printing when its first frame was drawn. Run it next to
 * {@code java -Dlatentledger.timing=true -jar target/latent-ledger.jar} to give the app's time as a
 * ratio on a machine whose load varies.
 */
public final class FirstFrameReference extends Application {
    /** A main outside the Application subclass, as for the app: a class-path launch needs it. */
    public static final class Launcher {
        public static void main(String[] args) {
            Application.launch(FirstFrameReference.class, args);
        }
    }

    @Override
    public void start(Stage stage) {
        stage.setScene(new Scene(new Label("reference"), 1280, 800));
        new AnimationTimer() {
            private int pulses;

            @Override
            public void handle(long now) {
                if (++pulses == 2) {
                    System.out.println("first frame " + (System.currentTimeMillis()
                            - ManagementFactory.getRuntimeMXBean().getStartTime()) + " ms after JVM start");
                    stop();
                }
            }
        }.start();
        stage.show();
    }
}
