package coilwright.service;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

class TreeDiffTest {
    private static final ObjectMapper M = new ObjectMapper();

    private static JsonNode j(String s) throws Exception {
        return M.readTree(s);
    }

    @Test
    void leaves_are_named_by_dotted_paths_with_array_indices() throws Exception {
        assertEquals(List.of("a.b", "c[0].d", "c[1]", "e"), List.copyOf(TreeDiff.leaves(j("{\"a\":{\"b\":1},\"c\":[{\"d\":2},3],\"e\":[]}")).keySet()));
    }

    @Test
    void differences_list_changed_added_and_removed_leaves() throws Exception {
        var d = TreeDiff.differences(j("{\"x\":1,\"y\":\"a\",\"z\":[1,2]}"), j("{\"x\":1.0,\"y\":\"b\",\"z\":[1],\"w\":true}"), 0);
        assertEquals(List.of(new TreeDiff.Difference("y", "a", "b"), new TreeDiff.Difference("z[1]", "2", TreeDiff.ABSENT),
                new TreeDiff.Difference("w", TreeDiff.ABSENT, "true")), d);
    }

    @Test
    void numbers_within_the_relative_tolerance_are_the_same() throws Exception {
        assertEquals(List.of(), TreeDiff.differences(j("{\"x\":1000.0}"), j("{\"x\":1000.0000009}"), 1e-9));
        assertEquals(1, TreeDiff.differences(j("{\"x\":1000.0}"), j("{\"x\":1000.000002}"), 1e-9).size());
        assertEquals(List.of(), TreeDiff.differences(j("{\"x\":0}"), j("{\"x\":0.0}"), 1e-9));
    }

    @Test
    void numeric_changes_ignore_new_outputs_but_not_lost_numbers() throws Exception {
        var c = TreeDiff.numericChanges(j("{\"a\":1,\"b\":2,\"t\":\"x\"}"), j("{\"a\":1,\"t\":\"y\",\"new\":5}"), 1e-9);
        assertEquals(List.of(new TreeDiff.Difference("b", "2", TreeDiff.ABSENT)), c);
    }
}
