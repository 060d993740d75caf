package coilwright.store;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.Base64;
import java.util.regex.Pattern;

/**
 * Content-derived ids: the first 128 bits of a SHA-256 digest, written as 22 characters of URL-safe base64
 * without padding (RFC 4648 section 5). Each kind of id hashes a distinct domain tag, then every field as its
 * UTF-8 length (4 bytes, big-endian) followed by its UTF-8 bytes, so that no two different field tuples share
 * a serialisation.
 *
 * <ul>
 *   <li>design id: tag {@code coilwright/design/v1}, fields (title, notes, inputJson) of its first revision;</li>
 *   <li>demo design id: tag {@code coilwright/demo/v1}, field (slug);</li>
 *   <li>revision id: tag {@code coilwright/revision/v1}, fields (designId, parentRevisionId or "", title,
 *       notes, inputJson). Including the design id keeps revision ids globally unique even when two designs
 *       hold the same content.</li>
 * </ul>
 */
public final class DesignIds {
    /** Length of every design and revision id. */
    public static final int ID_LENGTH = 22;
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9_-]{" + ID_LENGTH + "}");
    private static final Base64.Encoder B64 = Base64.getUrlEncoder().withoutPadding();

    private DesignIds() {
    }

    /** True when {@code id} has the shape of a design or revision id (checked before any query). */
    public static boolean isWellFormed(String id) {
        return id != null && ID.matcher(id).matches();
    }

    static String designId(DraftRevision first) {
        return digestId("coilwright/design/v1", first.title(), first.notes(), first.inputJson());
    }

    static String demoDesignId(String slug) {
        return digestId("coilwright/demo/v1", slug);
    }

    static String revisionId(String designId, String parentRevisionId, DraftRevision draft) {
        return digestId("coilwright/revision/v1", designId, parentRevisionId == null ? "" : parentRevisionId,
                draft.title(), draft.notes(), draft.inputJson());
    }

    static String digestId(String tag, String... fields) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (String field : prepend(tag, fields)) {
            byte[] bytes = field.getBytes(StandardCharsets.UTF_8);
            out.writeBytes(ByteBuffer.allocate(4).putInt(bytes.length).array());
            out.writeBytes(bytes);
        }
        return B64.encodeToString(Arrays.copyOf(sha256(out.toByteArray()), 16));
    }

    static byte[] sha256(byte[] data) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(data);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    static String base64Url(byte[] bytes) {
        return B64.encodeToString(bytes);
    }

    /** An id made safe to quote in a message: well-formed ids as they are, anything else shortened and masked. */
    static String printable(String id) {
        if (id == null) {
            return "(none)";
        }
        if (isWellFormed(id)) {
            return id;
        }
        String cut = id.length() > 40 ? id.substring(0, 40) + "..." : id;
        return "\"" + cut.replaceAll("[^A-Za-z0-9_.-]", "?") + "\"";
    }

    private static String[] prepend(String first, String[] rest) {
        String[] all = new String[rest.length + 1];
        all[0] = first;
        System.arraycopy(rest, 0, all, 1, rest.length);
        return all;
    }
}
