package app.latentledger.sync;

import app.latentledger.files.SafeFiles;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * The device token, kept beside the ledger in a file only the tech's account may read
 * ({@code rw-------}, written whole by {@link SafeFiles} as every private file of the app is). It
 * is never printed and never put in the ledger, so a copied ledger or bundle does not carry it.
 */
final class TokenFile {
    static final String NAME = "office-token";

    private final Path file;

    TokenFile(Path dataDir) {
        this.file = dataDir.resolve(NAME);
    }

    void write(String token) {
        try {
            SafeFiles.writeAtomically(file, out -> out.write(token.getBytes(StandardCharsets.UTF_8)),
                    SafeFiles.Durability.ON_DISK);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot keep the office token in " + file + ": " + e.getMessage(), e);
        }
    }

    Optional<String> read() {
        try {
            return Files.isRegularFile(file) ? Optional.of(Files.readString(file, StandardCharsets.UTF_8).strip())
                    : Optional.empty();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the office token in " + file + ": " + e.getMessage(), e);
        }
    }

    Path path() {
        return file;
    }
}
