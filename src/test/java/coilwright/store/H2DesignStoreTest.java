package coilwright.store;

import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

/** The store contract on the embedded H2 file database, each test in its own directory. */
class H2DesignStoreTest extends DesignStoreContract {
    @TempDir
    Path tempDir;

    @Override
    protected DatabaseSettings newDatabase() throws Exception {
        return TestDatabases.h2(Files.createTempDirectory(tempDir, "data"));
    }

    @Override
    protected void dispose(DatabaseSettings settings) {
        // the temporary directory is removed by JUnit
    }
}
