package app.latentledger.core.records;

import java.util.UUID;

/** New record ids: random, so records made on two tablets never collide when bundles meet. */
public final class Ids {
    private Ids() {
    }

    public static String newId() {
        return UUID.randomUUID().toString();
    }
}
