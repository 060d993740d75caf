package coilwright.store;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Base64;
import java.util.regex.Pattern;

/**
 * Secret edit tokens: 32 bytes from {@link java.security.SecureRandom} as 43 characters of URL-safe base64. Only the
 * token's SHA-256 digest is stored; a presented token is checked by hashing it and comparing the digests with
 * {@link MessageDigest#isEqual} (constant time).
 */
final class EditTokens {
    private static final Pattern TOKEN = Pattern.compile("[A-Za-z0-9_-]{43}");

    private EditTokens() {
    }

    static String newToken() {
        return DesignIds.base64Url(DesignIds.randomBytes(32));
    }

    /** The stored form: SHA-256 of the token's characters, URL-safe base64 (43 characters). */
    static String hash(String token) {
        return DesignIds.base64Url(DesignIds.sha256(token.getBytes(StandardCharsets.US_ASCII)));
    }

    /** True only when {@code token} is well-formed and its digest equals {@code storedHash}. */
    static boolean matches(String token, String storedHash) {
        if (token == null || storedHash == null || !TOKEN.matcher(token).matches()) {
            return false;
        }
        byte[] presented = DesignIds.sha256(token.getBytes(StandardCharsets.US_ASCII));
        byte[] stored;
        try {
            stored = Base64.getUrlDecoder().decode(storedHash);
        } catch (IllegalArgumentException e) {
            return false;
        }
        return MessageDigest.isEqual(presented, stored);
    }
}
