package coilwright.service;

import coilwright.store.DemoDesign;
import coilwright.store.DesignNotFoundException;
import coilwright.store.DesignStore;
import coilwright.store.DraftRevision;
import coilwright.store.EditForbiddenException;
import coilwright.store.StoreUnavailableException;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.github.benmanes.caffeine.cache.Cache;
import com.github.benmanes.caffeine.cache.Caffeine;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * Saved designs as the pages and the API see them. Saving evaluates the design, keeps the results the author saw
 * as a JSON snapshot and stores input, snapshot and tool version as one immutable revision. The input is stored as
 * canonical JSON (the request record written by the shared mapper, fields in declared order). Reading never
 * recomputes the saved numbers; {@link #recompute} shows what the current tool makes of the same input.
 *
 * <p>The store's refusals and failures leave here as this package's exceptions: {@link NoSuchDesignException},
 * {@link EditNotAllowedException} and {@link DesignStoreUnavailableException}.
 */
public final class DesignLibrary {
    /** Relative tolerance below which a recomputed number counts as the saved one. */
    public static final double RECOMPUTE_TOLERANCE = 1e-9;
    private static final Logger LOG = LoggerFactory.getLogger(DesignLibrary.class);
    private static final int RECOMPUTED_CACHE_ENTRIES = 512;

    private final EvaluationService evaluation;
    private final DesignStore store;
    private final ObjectMapper mapper;
    private final String toolVersion;
    private final Cache<String, Recomputation> recomputed = Caffeine.newBuilder()
            .maximumSize(RECOMPUTED_CACHE_ENTRIES).build();

    /**
     * @param mapper      the service's JSON mapper (strict, finite numbers only, sealed types with a "type" name)
     * @param toolVersion the version written beside every snapshot, e.g. {@link #currentToolVersion()}
     */
    public DesignLibrary(EvaluationService evaluation, DesignStore store, ObjectMapper mapper, String toolVersion) {
        this.evaluation = evaluation;
        this.store = store;
        this.mapper = mapper;
        this.toolVersion = toolVersion;
    }

    /** The version of this build: the jar's Maven version, or {@code dev} when run from classes. */
    public static String currentToolVersion() {
        try (var in = DesignLibrary.class.getResourceAsStream("/META-INF/maven/coilwright/coilwright/pom.properties")) {
            if (in != null) {
                var p = new java.util.Properties();
                p.load(in);
                return p.getProperty("version", "dev");
            }
        } catch (java.io.IOException e) {
            LOG.warn("cannot read the build version: {}", e.getMessage());
        }
        return "dev";
    }

    public String toolVersion() {
        return toolVersion;
    }

    /**
     * Evaluates and saves a new design under a new link with its own edit token, even when the same content was
     * saved before.
     *
     * @throws InvalidInputException      when the design is invalid
     * @throws InfeasibleDesignException  when it cannot be built
     */
    public SaveReceipt save(DesignDocument document) {
        DraftRevision draft = draft(document);
        return stored(() -> SaveReceipt.of(store.create(draft)));
    }

    /**
     * Adds {@code document} as the next revision of a design. The edit token is checked before the document is
     * evaluated, so a refused request costs no evaluation.
     *
     * @throws NoSuchDesignException   for an unknown design
     * @throws EditNotAllowedException for a missing or wrong edit token (nothing is evaluated or changed)
     */
    public SaveReceipt revise(String designId, String editToken, DesignDocument document) {
        stored(() -> {
            store.checkEditToken(designId, editToken);
            return designId;
        });
        DraftRevision draft = draft(document);
        return stored(() -> SaveReceipt.of(store.addRevision(designId, editToken, draft)));
    }

    /** @throws NoSuchDesignException for an unknown design */
    public SavedRevision latest(String designId) {
        return stored(() -> store.latest(designId)).map(SavedRevision::of).orElseThrow(() -> notFound(designId));
    }

    /** @throws NoSuchDesignException for an unknown revision */
    public SavedRevision revision(String revisionId) {
        return stored(() -> store.revision(revisionId)).map(SavedRevision::of).orElseThrow(() -> notFound(revisionId));
    }

    /** A revision by its own id, or a design's latest revision by the design id. */
    public SavedRevision resolve(String designOrRevisionId) {
        return stored(() -> store.revision(designOrRevisionId).or(() -> store.latest(designOrRevisionId)))
                .map(SavedRevision::of).orElseThrow(() -> notFound(designOrRevisionId));
    }

    /** The revisions of a design, oldest first. */
    public List<HistoryEntry> history(String designId) {
        return stored(() -> store.history(designId)).stream().map(HistoryEntry::of).toList();
    }

    public List<DemoEntry> demos() {
        return stored(store::demos).stream().map(DemoEntry::of).toList();
    }

    /** True when the database of saved designs answers now. */
    public boolean isStoreReachable() {
        return store.isReachable();
    }

    /** The saved input as a design file. */
    public DesignDocument document(SavedRevision r) {
        return new DesignDocument(DesignDocument.SCHEMA_VERSION, r.title(), r.notes(), request(r));
    }

    /**
     * Parses stored JSON (input or snapshot) into a tree, under the current input names: a revision saved under
     * names replaced since ({@link OldFieldNames}) reads, compares and recomputes like any other.
     */
    public JsonNode tree(String json) {
        try {
            JsonNode tree = mapper.readTree(json);
            OldFieldNames.upgradeTree(tree);
            return tree;
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored JSON does not parse: " + e.getOriginalMessage(), e);
        }
    }

    /** The current tool's results for a saved input, compared with the saved snapshot (cached per revision). */
    public Recomputation recompute(SavedRevision r) {
        return recomputed.get(r.revisionId(), id -> computeAgain(r));
    }

    /**
     * Loads the example files as demo designs: each new or changed example is evaluated and stored; an unchanged one
     * is left alone without evaluating it, so a restart costs no evaluation. An example that fails to evaluate is
     * skipped with a warning (a later version may compute it).
     *
     * @param examples slug to the text of a design file
     * @return the slugs stored or already present
     */
    public List<String> loadDemos(Map<String, String> examples) {
        Map<String, DemoDesign> present = new java.util.HashMap<>();
        stored(store::demos).forEach(d -> present.put(d.slug(), d));
        List<String> loaded = new java.util.ArrayList<>();
        for (Map.Entry<String, String> e : examples.entrySet()) {
            try {
                DesignDocument doc = mapper.readValue(e.getValue(), DesignDocument.class);
                DemoDesign old = present.get(e.getKey());
                if (old == null || !unchanged(revision(old.latestRevisionId()), doc)) {
                    DraftRevision draft = draft(doc);
                    stored(() -> store.ensureDemo(e.getKey(), draft));
                }
                loaded.add(e.getKey());
            } catch (JsonProcessingException | RuntimeException ex) {
                LOG.warn("demo design {} not loaded: {}", e.getKey(), ex.getMessage());
            }
        }
        return loaded;
    }

    private boolean unchanged(SavedRevision latest, DesignDocument doc) {
        return latest.title().equals(doc.title()) && latest.notes().equals(doc.notes())
                && latest.inputJson().equals(canonical(doc.design()));
    }

    private DraftRevision draft(DesignDocument document) {
        AlternatorEvaluation results = evaluation.evaluate(document.design());
        return new DraftRevision(document.title(), document.notes(), canonical(document.design()), write(results),
                toolVersion, document.schemaVersion());
    }

    /** The canonical input JSON: the request written by the shared mapper, fields in declared order. */
    public String canonical(EvaluationRequest request) {
        return write(request);
    }

    private String write(Object value) {
        try {
            return mapper.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write " + value.getClass().getSimpleName() + " as JSON: "
                    + e.getOriginalMessage(), e);
        }
    }

    private EvaluationRequest request(SavedRevision r) {
        try {
            return mapper.readValue(r.inputJson(), EvaluationRequest.class);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the saved input of revision " + r.revisionId()
                    + " does not fit the current input format: " + e.getOriginalMessage(), e);
        }
    }

    private Recomputation computeAgain(SavedRevision r) {
        JsonNode saved = tree(r.resultJson());
        try {
            JsonNode now = mapper.valueToTree(evaluation.evaluate(request(r)));
            return new Recomputation(r.revisionId(), r.toolVersion(), toolVersion, Optional.of(now), Optional.empty(),
                    TreeDiff.numericChanges(saved, now, RECOMPUTE_TOLERANCE));
        } catch (InvalidInputException | InfeasibleDesignException e) {
            return failed(r, "The current tool refuses this input: " + e.getMessage());
        } catch (RuntimeException e) {
            LOG.warn("recomputing revision {} failed", r.revisionId(), e);
            return failed(r, "The current tool could not compute this input (the failure is logged under revision "
                    + r.revisionId() + ").");
        }
    }

    private Recomputation failed(SavedRevision r, String why) {
        return new Recomputation(r.revisionId(), r.toolVersion(), toolVersion, Optional.empty(), Optional.of(why), List.of());
    }

    /** Runs a store call and gives its refusals and failures this package's meaning. */
    private static <T> T stored(Supplier<T> call) {
        try {
            return call.get();
        } catch (DesignNotFoundException e) {
            throw new NoSuchDesignException(sentence(e.getMessage()) + ".");
        } catch (EditForbiddenException e) {
            throw new EditNotAllowedException(sentence(e.getMessage()) + "; nothing was changed.");
        } catch (StoreUnavailableException e) {
            LOG.warn("saved designs unavailable: {}", e.getMessage());
            throw new DesignStoreUnavailableException("Saved designs are unavailable just now because their database "
                    + "cannot be reached; please try again shortly.", e);
        }
    }

    private static NoSuchDesignException notFound(String id) {
        return new NoSuchDesignException(sentence(new DesignNotFoundException(id).getMessage()) + ".");
    }

    private static String sentence(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
