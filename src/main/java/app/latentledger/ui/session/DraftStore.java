package app.latentledger.ui.session;

import java.util.List;
import java.util.Optional;

/** Where drafts are kept between taps, so a killed app or a walk to the truck loses nothing. */
public interface DraftStore {
    /** Keeps {@code draft}; on return it has reached the disk. */
    void save(Draft draft);

    /** The kept draft of a reading set, without its stored base (the caller adds it). */
    Optional<Draft> find(String readingSetId);

    /** Reading-set ids with a kept draft on {@code visitId}, most recently saved first. */
    List<String> forVisit(String visitId);
}
