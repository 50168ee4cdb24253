package app.latentledger.core.records;

/** Why the tech was there; a before/after pair is usually two reading sets in one visit. */
public enum VisitPurpose {
    COMPLAINT, COMMISSIONING, BEFORE, AFTER, FOLLOW_UP;

    /** The word stored and typed: "complaint", "commissioning", "before", "after", "follow-up". */
    public String key() {
        return Check.key(this);
    }

    public static VisitPurpose parse(String field, String key) {
        return Check.choice(field, VisitPurpose.class, key);
    }
}
