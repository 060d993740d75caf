package coilwright.store;

import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Base64;
import java.util.HashSet;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.*;

class DesignIdsTest {
    @Test
    void an_id_is_the_first_128_bits_of_sha256_over_the_length_prefixed_fields() {
        // Independent re-computation: tag and field each as 4-byte big-endian UTF-8 length, then the bytes.
        // source: FIPS 180-4 (SHA-256) via the JDK; RFC 4648 section 5 (base64url without padding).
        byte[] tag = "coilwright/demo/v1".getBytes(StandardCharsets.UTF_8);
        byte[] slug = "é".getBytes(StandardCharsets.UTF_8);
        byte[] message = new byte[4 + tag.length + 4 + slug.length];
        message[3] = (byte) tag.length;
        System.arraycopy(tag, 0, message, 4, tag.length);
        message[4 + tag.length + 3] = (byte) slug.length;
        System.arraycopy(slug, 0, message, 8 + tag.length, slug.length);
        String expected = Base64.getUrlEncoder().withoutPadding()
                .encodeToString(Arrays.copyOf(DesignIds.sha256(message), 16));
        assertEquals(expected, DesignIds.demoDesignId("é"));
        assertEquals(22, expected.length());
    }

    @Test
    void sha256_matches_the_published_test_vector_for_abc() {
        // source: FIPS 180-4 / NIST CSRC example "abc" -> ba7816bf 8f01cfea 414140de 5dae2223 b00361a3 96177a9c b410ff61 f20015ad
        byte[] h = DesignIds.sha256("abc".getBytes(StandardCharsets.US_ASCII));
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", java.util.HexFormat.of().formatHex(h));
    }

    @Test
    void new_ids_are_random_well_formed_and_never_repeat() {
        Set<String> ids = new HashSet<>();
        for (int i = 0; i < 20_000; i++) {
            String id = DesignIds.random();
            assertTrue(DesignIds.isWellFormed(id), id);
            assertTrue(ids.add(id), "repeated id " + id);
        }
    }

    @Test
    void well_formed_ids_are_exactly_22_base64url_characters() {
        assertTrue(DesignIds.isWellFormed("AZaz09_-AZaz09_-AZaz09"));
        assertFalse(DesignIds.isWellFormed("AZaz09_-AZaz09_-AZaz0"));
        assertFalse(DesignIds.isWellFormed("AZaz09_-AZaz09_-AZaz09A"));
        assertFalse(DesignIds.isWellFormed("AZaz09+/AZaz09_-AZaz09"));
        assertFalse(DesignIds.isWellFormed("AZaz09_-AZaz09_-AZaz0="));
        assertFalse(DesignIds.isWellFormed(null));
    }

    @Test
    void successive_ids_share_about_half_their_bits() {
        // An id must say nothing about the one before it: over 2000 pairs the mean number of differing bits of 128
        // is 64 with a standard error of sqrt(128 / 4 / 2000) = 0.13, so 1.0 is a loose but failing bound.
        long differing = 0;
        int pairs = 2000;
        byte[] previous = Base64.getUrlDecoder().decode(DesignIds.random());
        for (int i = 0; i < pairs; i++) {
            byte[] next = Base64.getUrlDecoder().decode(DesignIds.random());
            for (int k = 0; k < 16; k++) {
                differing += Integer.bitCount((previous[k] ^ next[k]) & 0xff);
            }
            previous = next;
        }
        assertEquals(64.0, differing / (double) pairs, 1.0, "mean differing bits of 128 between successive ids");
    }

    @Test
    void printable_masks_anything_that_is_not_an_id() {
        assertEquals("\"?script?\"", DesignIds.printable("<script>"));
        assertEquals("AZaz09_-AZaz09_-AZaz09", DesignIds.printable("AZaz09_-AZaz09_-AZaz09"));
        assertEquals("(none)", DesignIds.printable(null));
    }
}
