package coilwright.store;

import coilwright.validation.FieldError;
import coilwright.validation.InvalidInputException;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Saved designs: each design is a chain of immutable revisions numbered 1, 2, 3, ... with random ids
 * (see {@link DesignIds}). Creating a design hands out its secret edit token once; only that token can add a
 * revision. Nothing here lists designs except the demo designs.
 *
 * <p>Thread-safe, also across processes sharing one database. Concurrent revisions of one design are serialised
 * by a row lock ({@code SELECT ... FOR UPDATE}) on the design; the schema itself refuses a repeated number
 * (unique per design) and a gap (every revision after the first names its predecessor's number, a foreign key).
 * Ids that are not well-formed are treated as unknown without a query.
 */
public final class DesignStore {
    private static final Pattern SLUG = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,99}");

    private final Database database;
    private final Transactions tx;
    private final Clock clock;

    public DesignStore(Database database) {
        this(database, Clock.systemUTC());
    }

    DesignStore(Database database, Clock clock) {
        this.database = database;
        this.tx = new Transactions(database.dataSource());
        this.clock = clock;
    }

    /**
     * Saves a new design whose first revision is {@code draft}, under a new random id, and hands out its edit token
     * (once: only its hash is kept). Saving the same content twice makes two designs, each with its own link and
     * token, so nobody can claim a link by saving somebody else's content first.
     */
    public SaveOutcome create(DraftRevision draft) {
        return tx.inTransaction("saving a design", c -> {
            // ids are drawn inside the transaction, so a retry after a (vanishingly unlikely) clash draws new ones
            String designId = DesignIds.random();
            String revisionId = DesignIds.random();
            String token = EditTokens.newToken();
            Instant now = now();
            RevisionRows.insertDesign(c, designId, EditTokens.hash(token), null, revisionId, now);
            RevisionRows.insertRevision(c, revisionId, designId, 1, null, draft, now);
            return new SaveOutcome(designId, revisionId, Optional.of(token), true);
        });
    }

    /**
     * Checks that {@code editToken} allows changing the design, without changing anything: lets a caller refuse a
     * revision before doing the work of preparing it. {@link #addRevision} checks again.
     *
     * @throws DesignNotFoundException when no design has this id
     * @throws EditForbiddenException  when {@code editToken} is missing or wrong (demo designs accept none)
     */
    public void checkEditToken(String designId, String editToken) {
        if (!DesignIds.isWellFormed(designId)) {
            throw new DesignNotFoundException(designId);
        }
        RevisionRows.DesignHead head = tx.read("checking an edit token", c -> RevisionRows.head(c, designId, false))
                .orElseThrow(() -> new DesignNotFoundException(designId));
        if (!EditTokens.matches(editToken, head.editTokenHash())) {
            throw new EditForbiddenException(designId);
        }
    }

    /**
     * Adds {@code draft} as the next revision of a design. When it has the same title, notes and input as the
     * latest revision, returns the latest ({@code created = false}) and stores nothing.
     *
     * @throws DesignNotFoundException when no design has this id
     * @throws EditForbiddenException  when {@code editToken} is missing or wrong (demo designs accept none)
     */
    public SaveOutcome addRevision(String designId, String editToken, DraftRevision draft) {
        if (!DesignIds.isWellFormed(designId)) {
            throw new DesignNotFoundException(designId);
        }
        return tx.inTransaction("adding a revision", c -> {
            RevisionRows.DesignHead unlocked = RevisionRows.head(c, designId, false)
                    .orElseThrow(() -> new DesignNotFoundException(designId));
            if (!EditTokens.matches(editToken, unlocked.editTokenHash())) {
                throw new EditForbiddenException(designId);
            }
            RevisionRows.DesignHead head = RevisionRows.head(c, designId, true)
                    .orElseThrow(() -> new DesignNotFoundException(designId));
            return append(c, designId, head, draft);
        });
    }

    /** The latest revision of a design, or empty for an unknown or malformed id. */
    public Optional<StoredRevision> latest(String designId) {
        if (!DesignIds.isWellFormed(designId)) {
            return Optional.empty();
        }
        return tx.read("reading a design", c -> RevisionRows.latest(c, designId));
    }

    /** One revision by its own id (revision ids are unique across designs), or empty. */
    public Optional<StoredRevision> revision(String revisionId) {
        if (!DesignIds.isWellFormed(revisionId)) {
            return Optional.empty();
        }
        return tx.read("reading a revision", c -> RevisionRows.revision(c, revisionId));
    }

    /** Every revision of a design, oldest first; empty for an unknown or malformed id. */
    public List<RevisionSummary> history(String designId) {
        if (!DesignIds.isWellFormed(designId)) {
            return List.of();
        }
        return tx.read("reading a design's history", c -> RevisionRows.history(c, designId));
    }

    /**
     * Makes sure the demo design named {@code slug} exists with {@code draft} as its latest content, and
     * returns its design id. Idempotent: calling it again with the same draft changes nothing; with a changed
     * draft (a new example file) it adds one revision, so older links keep their content. Demo designs have
     * no edit token and cannot be changed through {@link #addRevision}.
     *
     * @throws InvalidInputException when {@code slug} is not 1 to 100 letters, digits, '.', '_' or '-'
     */
    public String ensureDemo(String slug, DraftRevision draft) {
        if (slug == null || !SLUG.matcher(slug).matches()) {
            throw new InvalidInputException(new FieldError("slug", String.valueOf(slug),
                    "slug = " + slug + ": must be 1 to 100 letters, digits, '.', '_' or '-', starting with a letter or digit",
                    "[A-Za-z0-9][A-Za-z0-9._-]{0,99}"));
        }
        String designId = DesignIds.demoDesignId(slug);
        return tx.inTransaction("loading a demo design", c -> {
            Optional<RevisionRows.DesignHead> head = RevisionRows.head(c, designId, true);
            if (head.isPresent()) {
                append(c, designId, head.get(), draft);
            } else {
                String revisionId = DesignIds.random();
                Instant now = now();
                RevisionRows.insertDesign(c, designId, null, slug, revisionId, now);
                RevisionRows.insertRevision(c, revisionId, designId, 1, null, draft, now);
            }
            return designId;
        });
    }

    /** True when the database answers now (for /health; at most one probe a second, see {@link Database}). */
    public boolean isReachable() {
        return database.isReachable(2);
    }

    /** The demo designs, by slug: the only listing the store offers. */
    public List<DemoDesign> demos() {
        return tx.read("listing demo designs", RevisionRows::demos);
    }

    /** Appends {@code draft} after the locked head unless it repeats the latest revision's content. */
    private SaveOutcome append(Connection c, String designId, RevisionRows.DesignHead head, DraftRevision draft)
            throws SQLException {
        StoredRevision latest = RevisionRows.revision(c, head.latestRevisionId())
                .orElseThrow(() -> new SQLException("design " + designId + " points at a missing revision"));
        if (draft.sameContentAs(latest.title(), latest.notes(), latest.inputJson())) {
            return new SaveOutcome(designId, latest.revisionId(), Optional.empty(), false);
        }
        String revisionId = DesignIds.random();
        int number = head.latestNumber() + 1;
        RevisionRows.insertRevision(c, revisionId, designId, number, head.latestRevisionId(), draft, now());
        RevisionRows.moveHead(c, designId, revisionId, number);
        return new SaveOutcome(designId, revisionId, Optional.empty(), true);
    }

    private Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.MICROS);
    }
}
