package app.latentledger.sync;

import java.time.OffsetDateTime;

/**
 * The office this tablet syncs with. The device token is not here: it stays in its own private
 * file ({@link TokenFile}) and is read only to make a request.
 *
 * @param serverUrl  the server's address, e.g. {@code https://office.saltreed.example}
 * @param deviceId   the server's id for this tablet
 * @param deviceName what the tablet is called in the office's device list
 * @param company    the company the tablet belongs to
 * @param technician who the tablet was enrolled for
 * @param role       {@code technician} or {@code office}
 * @param enrolledAt when
 */
public record OfficeAccount(String serverUrl, String deviceId, String deviceName, String company, String technician,
                            String role, OffsetDateTime enrolledAt) {
}
