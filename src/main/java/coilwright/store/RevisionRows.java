package coilwright.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** The SQL of the store: one method per statement, plain JDBC, portable between H2 and PostgreSQL. */
final class RevisionRows {
    private static final String REVISION_COLUMNS = "r.design_id, r.revision_id, r.revision_number, r.title, r.notes, "
            + "r.input_json, r.result_json, r.tool_version, r.schema_version, r.created_at, d.latest_revision_id";

    /** The design row's mutable part: who may edit it and where its chain ends. */
    record DesignHead(String editTokenHash, String latestRevisionId, int latestNumber) {
    }

    private RevisionRows() {
    }

    static Optional<DesignHead> head(Connection c, String designId, boolean forUpdate) throws SQLException {
        String sql = "SELECT edit_token_hash, latest_revision_id, latest_number FROM design WHERE design_id = ?"
                + (forUpdate ? " FOR UPDATE" : "");
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            ps.setString(1, designId);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(new DesignHead(rs.getString(1), rs.getString(2), rs.getInt(3)))
                        : Optional.empty();
            }
        }
    }

    static void insertDesign(Connection c, String designId, String editTokenHash, String demoSlug,
                             String firstRevisionId, Instant now) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO design (design_id, edit_token_hash, demo_slug, "
                + "latest_revision_id, latest_number, created_at) VALUES (?, ?, ?, ?, 1, ?)")) {
            ps.setString(1, designId);
            ps.setString(2, editTokenHash);
            ps.setString(3, demoSlug);
            ps.setString(4, firstRevisionId);
            ps.setObject(5, utc(now));
            ps.executeUpdate();
        }
    }

    static void moveHead(Connection c, String designId, String latestRevisionId, int latestNumber) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "UPDATE design SET latest_revision_id = ?, latest_number = ? WHERE design_id = ?")) {
            ps.setString(1, latestRevisionId);
            ps.setInt(2, latestNumber);
            ps.setString(3, designId);
            if (ps.executeUpdate() != 1) {
                throw new SQLException("design " + designId + " vanished while adding a revision");
            }
        }
    }

    static void insertRevision(Connection c, String revisionId, String designId, int number, String parentId,
                               DraftRevision d, Instant now) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO revision (revision_id, design_id, revision_number, "
                + "parent_revision_id, title, notes, input_json, result_json, tool_version, schema_version, created_at, "
                + "previous_number) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setString(1, revisionId);
            ps.setString(2, designId);
            ps.setInt(3, number);
            ps.setString(4, parentId);
            ps.setString(5, d.title());
            ps.setString(6, d.notes());
            ps.setString(7, d.inputJson());
            ps.setString(8, d.resultJson());
            ps.setString(9, d.toolVersion());
            ps.setInt(10, d.schemaVersion());
            ps.setObject(11, utc(now));
            if (number > 1) {
                ps.setInt(12, number - 1);
            } else {
                ps.setNull(12, java.sql.Types.INTEGER);
            }
            ps.executeUpdate();
        }
    }

    static Optional<StoredRevision> latest(Connection c, String designId) throws SQLException {
        return one(c, "SELECT " + REVISION_COLUMNS + " FROM design d JOIN revision r ON r.revision_id = d.latest_revision_id"
                + " WHERE d.design_id = ?", designId);
    }

    static Optional<StoredRevision> revision(Connection c, String revisionId) throws SQLException {
        return one(c, "SELECT " + REVISION_COLUMNS + " FROM revision r JOIN design d ON d.design_id = r.design_id"
                + " WHERE r.revision_id = ?", revisionId);
    }

    static List<RevisionSummary> history(Connection c, String designId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT revision_number, revision_id, created_at, title"
                + " FROM revision WHERE design_id = ? ORDER BY revision_number")) {
            ps.setString(1, designId);
            List<RevisionSummary> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(new RevisionSummary(rs.getInt(1), rs.getString(2), instant(rs, 3), rs.getString(4)));
                }
            }
            return out;
        }
    }

    static List<DemoDesign> demos(Connection c) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT d.demo_slug, d.design_id, d.latest_revision_id, r.title"
                + " FROM design d JOIN revision r ON r.revision_id = d.latest_revision_id"
                + " WHERE d.demo_slug IS NOT NULL ORDER BY d.demo_slug");
             ResultSet rs = ps.executeQuery()) {
            List<DemoDesign> out = new ArrayList<>();
            while (rs.next()) {
                out.add(new DemoDesign(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4)));
            }
            return out;
        }
    }

    private static Optional<StoredRevision> one(Connection c, String sql, String id) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            ps.setString(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                return Optional.of(new StoredRevision(rs.getString(1), rs.getString(2), rs.getInt(3), rs.getString(4),
                        rs.getString(5), rs.getString(6), rs.getString(7), rs.getString(8), rs.getInt(9),
                        instant(rs, 10), rs.getString(11)));
            }
        }
    }

    private static OffsetDateTime utc(Instant t) {
        return OffsetDateTime.ofInstant(t, ZoneOffset.UTC);
    }

    private static Instant instant(ResultSet rs, int column) throws SQLException {
        return rs.getObject(column, OffsetDateTime.class).toInstant();
    }
}
