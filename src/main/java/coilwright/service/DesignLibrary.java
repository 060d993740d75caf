package coilwright.service;

import coilwright.store.DemoDesign;
import coilwright.store.DesignNotFoundException;
import coilwright.store.DesignStore;
import coilwright.store.DraftRevision;
import coilwright.store.RevisionSummary;
import coilwright.store.SaveOutcome;
import coilwright.store.StoredRevision;
import coilwright.system.AlternatorEvaluation;
import coilwright.system.EvaluationRequest;
import coilwright.validation.InfeasibleDesignException;
import coilwright.validation.InvalidInputException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Saved designs as the pages and the API see them. Saving evaluates the design, keeps the results the author saw
 * as a JSON snapshot and stores input, snapshot and tool version as one immutable revision. The input is stored as
 * canonical JSON (the request record written by the shared mapper, fields in declared order), so the same
 * input always gives the same ids. Reading never recomputes the saved numbers; {@link #recompute} shows what the
 * current tool makes of the same input.
 */
public final class DesignLibrary {
    /** Relative tolerance below which a recomputed number counts as the saved one. */
    public static final double RECOMPUTE_TOLERANCE = 1e-9;
    private static final Logger LOG = LoggerFactory.getLogger(DesignLibrary.class);
    private static final int CACHE_LIMIT = 512;

    private final EvaluationService evaluation;
    private final DesignStore store;
    private final ObjectMapper mapper;
    private final String toolVersion;
    private final Map<String, Recomputation> recomputed = new ConcurrentHashMap<>();

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
     * Evaluates and saves a new design. Saving the same title, notes and input again returns the same ids
     * without an edit token.
     *
     * @throws InvalidInputException      when the design is invalid
     * @throws InfeasibleDesignException  when it cannot be built
     */
    public SaveOutcome save(DesignDocument document) {
        return store.create(draft(document));
    }

    /**
     * Evaluates {@code document} and adds it as the next revision of a design.
     *
     * @throws DesignNotFoundException             for an unknown design
     * @throws coilwright.store.EditForbiddenException for a missing or wrong edit token (nothing changes)
     */
    public SaveOutcome revise(String designId, String editToken, DesignDocument document) {
        latest(designId);
        return store.addRevision(designId, editToken, draft(document));
    }

    /** @throws DesignNotFoundException for an unknown design */
    public StoredRevision latest(String designId) {
        return store.latest(designId).orElseThrow(() -> new DesignNotFoundException(designId));
    }

    /** @throws DesignNotFoundException for an unknown revision */
    public StoredRevision revision(String revisionId) {
        return store.revision(revisionId).orElseThrow(() -> new DesignNotFoundException(revisionId));
    }

    /** A revision by its own id, or a design's latest revision by the design id. */
    public StoredRevision resolve(String designOrRevisionId) {
        return store.revision(designOrRevisionId).or(() -> store.latest(designOrRevisionId))
                .orElseThrow(() -> new DesignNotFoundException(designOrRevisionId));
    }

    /** The revisions of a design, oldest first. */
    public List<RevisionSummary> history(String designId) {
        return store.history(designId);
    }

    public List<DemoDesign> demos() {
        return store.demos();
    }

    /** The saved input as a design file. */
    public DesignDocument document(StoredRevision r) {
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
    public Recomputation recompute(StoredRevision r) {
        Recomputation cached = recomputed.get(r.revisionId());
        if (cached != null) {
            return cached;
        }
        Recomputation fresh = computeAgain(r);
        if (recomputed.size() >= CACHE_LIMIT) {
            recomputed.clear();
        }
        recomputed.put(r.revisionId(), fresh);
        return fresh;
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
        store.demos().forEach(d -> present.put(d.slug(), d));
        List<String> loaded = new java.util.ArrayList<>();
        for (Map.Entry<String, String> e : examples.entrySet()) {
            try {
                DesignDocument doc = mapper.readValue(e.getValue(), DesignDocument.class);
                DemoDesign old = present.get(e.getKey());
                if (old == null || !unchanged(revision(old.latestRevisionId()), doc)) {
                    store.ensureDemo(e.getKey(), draft(doc));
                }
                loaded.add(e.getKey());
            } catch (JsonProcessingException | RuntimeException ex) {
                LOG.warn("demo design {} not loaded: {}", e.getKey(), ex.getMessage());
            }
        }
        return loaded;
    }

    private boolean unchanged(StoredRevision latest, DesignDocument doc) {
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

    private EvaluationRequest request(StoredRevision r) {
        try {
            return mapper.readValue(r.inputJson(), EvaluationRequest.class);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the saved input of revision " + r.revisionId()
                    + " does not fit the current input format: " + e.getOriginalMessage(), e);
        }
    }

    private Recomputation computeAgain(StoredRevision r) {
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

    private Recomputation failed(StoredRevision r, String why) {
        return new Recomputation(r.revisionId(), r.toolVersion(), toolVersion, Optional.empty(), Optional.of(why), List.of());
    }
}
