package app.latentledger.ui.look;

/** A screen that lays itself out differently when the tablet is held upright. */
public interface Reflowing {
    void setPortrait(boolean portrait);
}
