package app.latentledger.server;

import java.util.UUID;

/**
 * Who is calling, from a valid device token: every query of the API is limited to {@link #companyId}.
 *
 * @param role {@code technician} or {@code office}
 */
public record Caller(UUID deviceId, UUID personId, UUID companyId, String role, String companyName,
                     String personName) {
}
