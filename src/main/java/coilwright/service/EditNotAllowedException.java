package coilwright.service;

/** The edit token is missing or does not belong to the design (HTTP 403). Nothing was evaluated or changed. */
public class EditNotAllowedException extends RuntimeException {
    public EditNotAllowedException(String message) {
        super(message);
    }
}
