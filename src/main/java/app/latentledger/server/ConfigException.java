package app.latentledger.server;

/** A setting of the server that cannot be used; the message names it, its value and what is accepted. */
public final class ConfigException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public ConfigException(String message) {
        super(message);
    }
}
