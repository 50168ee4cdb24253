package app.latentledger.handoff;

import java.io.File;
import java.io.IOException;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Optional;
import java.util.Set;

/**
 * Sharing through Gluon Attach's share service where the build carries it (the Android and iOS
 * builds; the desktop build has no share implementation). Looked up by name, so the desktop build
 * needs no share dependency and simply offers no share button.
 */
public final class AttachShare implements HandOff {
    static final String SERVICE = "com.gluonhq.attach.share.ShareService";

    private final Object service;
    private final Method share;

    private AttachShare(Object service, Method share) {
        this.service = service;
        this.share = share;
    }

    /** The share service of this device, or empty when the build or the platform has none. */
    public static Optional<AttachShare> find() {
        return find(SERVICE);
    }

    static Optional<AttachShare> find(String className) {
        try {
            Class<?> type = Class.forName(className);
            Optional<?> created = (Optional<?>) type.getMethod("create").invoke(null);
            if (created.isEmpty()) {
                return Optional.empty();
            }
            Method share = type.getMethod("share", String.class, String.class, String.class, File.class);
            return Optional.of(new AttachShare(created.get(), share));
        } catch (ReflectiveOperationException | ClassCastException | LinkageError e) {
            return Optional.empty();
        }
    }

    @Override
    public Set<Action> available() {
        return EnumSet.of(Action.SHARE);
    }

    @Override
    public void run(Action action, Path file, String title) throws IOException {
        if (action != Action.SHARE) {
            throw new IOException("the share service only shares");
        }
        String type = file.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".pdf")
                ? "application/pdf" : "application/zip";
        try {
            share.invoke(service, title, title, type, file.toFile());
        } catch (InvocationTargetException e) {
            throw new IOException("could not share " + file.getFileName() + ": " + e.getCause(), e.getCause());
        } catch (IllegalAccessException e) {
            throw new IOException("could not share " + file.getFileName() + ": " + e, e);
        }
    }
}
