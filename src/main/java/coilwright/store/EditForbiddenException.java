package coilwright.store;

/** The edit token is missing or does not belong to the design (the API answers 403). Nothing was changed. */
public class EditForbiddenException extends RuntimeException {
    public EditForbiddenException(String designId) {
        super("the edit token does not allow changing design " + DesignIds.printable(designId));
    }
}
