package coilwright.store;

import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Base64;
import java.util.HashSet;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.*;

class DesignIdsTest {
    static DraftRevision d(String title, String notes, String input) {
        return new DraftRevision(title, notes, input, "{}", "t", 1);
    }

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
    void ids_depend_on_every_content_field_and_not_on_results_or_tool_version() {
        DraftRevision base = d("a", "b", "{}");
        String id = DesignIds.designId(base);
        assertNotEquals(id, DesignIds.designId(d("a!", "b", "{}")));
        assertNotEquals(id, DesignIds.designId(d("a", "b!", "{}")));
        assertNotEquals(id, DesignIds.designId(d("a", "b", "{ }")));
        assertEquals(id, DesignIds.designId(new DraftRevision("a", "b", "{}", "{\"other\":1}", "9.9", 2)));
    }

    @Test
    void moving_text_between_fields_changes_the_id() {
        assertNotEquals(DesignIds.designId(d("ab", "", "{}")), DesignIds.designId(d("a", "b", "{}")));
        assertNotEquals(DesignIds.revisionId("x", "", d("a", "b", "{}")), DesignIds.revisionId("x", "a", d("", "b", "{}")));
    }

    @Test
    void revision_ids_differ_by_design_and_by_parent() {
        DraftRevision c = d("a", "b", "{}");
        Set<String> ids = new HashSet<>();
        ids.add(DesignIds.designId(c));
        ids.add(DesignIds.revisionId("design1", "", c));
        ids.add(DesignIds.revisionId("design2", "", c));
        ids.add(DesignIds.revisionId("design1", "parent", c));
        assertEquals(4, ids.size());
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
    void ids_of_neighbouring_inputs_share_about_half_their_bits() {
        // Adjacent content must not give adjacent ids: compare bit distance over many neighbours.
        long differing = 0;
        int pairs = 200;
        for (int i = 0; i < pairs; i++) {
            byte[] a = Base64.getUrlDecoder().decode(DesignIds.designId(d("t", "", "{\"n\":" + i + "}")));
            byte[] b = Base64.getUrlDecoder().decode(DesignIds.designId(d("t", "", "{\"n\":" + (i + 1) + "}")));
            for (int k = 0; k < 16; k++) {
                differing += Integer.bitCount((a[k] ^ b[k]) & 0xff);
            }
        }
        double mean = differing / (double) pairs;
        assertEquals(64.0, mean, 3.0, "mean differing bits of 128 between neighbours");
    }

    @Test
    void printable_masks_anything_that_is_not_an_id() {
        assertEquals("\"?script?\"", DesignIds.printable("<script>"));
        assertEquals("AZaz09_-AZaz09_-AZaz09", DesignIds.printable("AZaz09_-AZaz09_-AZaz09"));
        assertEquals("(none)", DesignIds.printable(null));
    }
}
