package coilwright.store;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Arrays;
import java.util.Base64;
import java.util.regex.Pattern;

/**
 * Ids of designs and revisions: 128 bits written as 22 characters of URL-safe base64 without padding
 * (RFC 4648 section 5).
 *
 * <ul>
 *   <li>design and revision ids: 128 random bits from {@link SecureRandom}. They cannot be computed from the
 *       content, so a link can be neither found by trying likely designs nor taken over by saving the same
 *       content first;</li>
 *   <li>demo design id: the first 128 bits of SHA-256 over the tag {@code coilwright/demo/v1} and the slug, each
 *       written as its UTF-8 length (4 bytes, big-endian) and its UTF-8 bytes. Demos are public, and this keeps
 *       their links the same on every start and every instance.</li>
 * </ul>
 * Designs saved before random ids keep the content-derived ids they were given: ids are stored, never recomputed.
 */
public final class DesignIds {
    /** Length of every design and revision id. */
    public static final int ID_LENGTH = 22;
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9_-]{" + ID_LENGTH + "}");
    private static final Base64.Encoder B64 = Base64.getUrlEncoder().withoutPadding();
    private static final SecureRandom RANDOM = new SecureRandom();

    private DesignIds() {
    }

    /** True when {@code id} has the shape of a design or revision id (checked before any query). */
    public static boolean isWellFormed(String id) {
        return id != null && ID.matcher(id).matches();
    }

    /** A new design or revision id: 128 random bits. */
    static String random() {
        return base64Url(randomBytes(16));
    }

    static byte[] randomBytes(int n) {
        byte[] bytes = new byte[n];
        RANDOM.nextBytes(bytes);
        return bytes;
    }

    static String demoDesignId(String slug) {
        return digestId("coilwright/demo/v1", slug);
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
    public static String printable(String id) {
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
