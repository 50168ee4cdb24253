package app.latentledger.core.records;

/**
 * The written part of a visit: the customer's words, what was done, and the two sign-offs.
 *
 * @param visitId       the visit
 * @param customerWords the complaint or request in the customer's own words
 * @param workDone      what the technician did and changed
 * @param technician    the technician's sign-off, or null while not signed
 * @param customer      the customer's sign-off, or null while not signed
 */
public record VisitPaperwork(String visitId, String customerWords, String workDone, SignOff technician,
                             SignOff customer) {
    public VisitPaperwork {
        visitId = Check.id("paperwork visit", visitId);
        customerWords = Check.optionalText("customer's words", customerWords, 10_000);
        workDone = Check.optionalText("work done", workDone, 10_000);
    }

    /** Nothing written and nobody signed yet. */
    public static VisitPaperwork blank(String visitId) {
        return new VisitPaperwork(visitId, "", "", null, null);
    }

    public boolean isBlank() {
        return customerWords.isEmpty() && workDone.isEmpty() && technician == null && customer == null;
    }

    public VisitPaperwork withNotes(String customerWords, String workDone) {
        return new VisitPaperwork(visitId, customerWords, workDone, technician, customer);
    }

    public VisitPaperwork withTechnician(SignOff s) {
        return new VisitPaperwork(visitId, customerWords, workDone, s, customer);
    }

    public VisitPaperwork withCustomer(SignOff s) {
        return new VisitPaperwork(visitId, customerWords, workDone, technician, s);
    }
}
