package app.latentledger.ui.look;

import app.latentledger.core.records.SystemType;
import javafx.beans.property.ObjectProperty;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.FlowPane;

/**
 * How a system's capacity steps, picked with one toggle per {@link SystemType} ("single stage",
 * "two stage", "variable capacity"), each a full touch target. The one control for it: the Job
 * screen's new-system form and the Record screen's "system as found" both use it. Binds only.
 */
public final class StageChoice {
    private StageChoice() {
    }

    /** The toggles, ids {@code idPrefix + key} ("stages-two-stage"), following and setting {@code chosen}. */
    public static FlowPane toggles(String idPrefix, ObjectProperty<SystemType> chosen) {
        ToggleGroup group = new ToggleGroup();
        FlowPane stages = new FlowPane(8, 8);
        for (SystemType t : SystemType.values()) {
            ToggleButton b = new ToggleButton(t.key().replace('-', ' '));
            b.setId(idPrefix + t.key());
            b.setMinHeight(Ui.MIN_TARGET_PX);
            b.setToggleGroup(group);
            b.setSelected(chosen.get() == t);
            b.setOnAction(e -> {
                // a second tap on the chosen one keeps it chosen: a system always has a staging
                b.setSelected(true);
                chosen.set(t);
            });
            chosen.addListener((o, was, now) -> b.setSelected(now == t));
            stages.getChildren().add(b);
        }
        return stages;
    }
}
