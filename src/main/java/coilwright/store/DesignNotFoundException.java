package coilwright.store;

/** No design or revision has the given id (the API answers 404). Malformed ids are reported the same way. */
public class DesignNotFoundException extends RuntimeException {
    private final String id;

    public DesignNotFoundException(String id) {
        super("no saved design has the id " + DesignIds.printable(id));
        this.id = id;
    }

    public String id() {
        return id;
    }
}
