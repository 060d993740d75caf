package coilwright.store;

import org.junit.jupiter.api.Test;

import java.util.Base64;
import java.util.HashSet;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.*;

class EditTokensTest {
    @Test
    void a_token_is_32_random_bytes_in_43_url_safe_characters() {
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < 1000; i++) {
            String t = EditTokens.newToken();
            assertEquals(43, t.length());
            assertEquals(32, Base64.getUrlDecoder().decode(t).length);
            assertTrue(seen.add(t), "tokens repeat");
        }
    }

    @Test
    void only_the_hash_is_kept_and_only_the_right_token_matches_it() {
        String token = EditTokens.newToken();
        String stored = EditTokens.hash(token);
        assertNotEquals(token, stored);
        assertFalse(stored.contains(token));
        assertTrue(EditTokens.matches(token, stored));
        assertFalse(EditTokens.matches(EditTokens.newToken(), stored));
        assertFalse(EditTokens.matches(token.substring(1) + "A", stored));
        assertFalse(EditTokens.matches(stored, stored), "the stored hash is not itself a token");
    }

    @Test
    void missing_or_malformed_tokens_and_designs_without_a_token_never_match() {
        String token = EditTokens.newToken();
        assertFalse(EditTokens.matches(null, EditTokens.hash(token)));
        assertFalse(EditTokens.matches("", EditTokens.hash(token)));
        assertFalse(EditTokens.matches(token + "=", EditTokens.hash(token)));
        assertFalse(EditTokens.matches(token, null), "demo designs have no token hash");
        assertFalse(EditTokens.matches(token, "not base64 !"));
    }
}
