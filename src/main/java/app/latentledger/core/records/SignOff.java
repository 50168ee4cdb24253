package app.latentledger.core.records;

import java.time.OffsetDateTime;
import java.time.temporal.ChronoUnit;

/**
 * A typed sign-off on a visit: who, when, and what they added (the customer's remark, or the
 * technician's licence or certification number).
 *
 * @param name     the person's name as they give it
 * @param signedAt when, to the second
 * @param remark   free text, "" when none
 */
public record SignOff(String name, OffsetDateTime signedAt, String remark) {
    public SignOff {
        name = Check.text("sign-off name", name, 200);
        signedAt = Check.present("sign-off time", signedAt).truncatedTo(ChronoUnit.SECONDS);
        remark = Check.optionalText("sign-off remark", remark, 2000);
    }
}
