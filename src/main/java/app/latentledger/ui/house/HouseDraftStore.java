package app.latentledger.ui.house;

/**
 * Where the House pad's waiting numbers are kept between taps, so a killed app or a walk to the
 * truck loses none: the same promise as the Readings pad's {@code ui.session.DraftStore}.
 */
public interface HouseDraftStore {
    /** Keeps {@code draft} (an empty one removes what was kept); on return it has reached the disk. */
    void save(HouseDraft draft);

    /** The kept draft of {@code visitId}, empty when none. */
    HouseDraft find(String visitId);
}
