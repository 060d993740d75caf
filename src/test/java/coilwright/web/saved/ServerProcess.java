package coilwright.web.saved;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

/** The real server ({@code coilwright.App}) as a separate JVM with the test classpath, on a free port. */
final class ServerProcess implements AutoCloseable {
    static final HttpClient HTTP = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    final Process process;
    final int port;
    final Path log;

    private ServerProcess(Process process, int port, Path log) {
        this.process = process;
        this.port = port;
        this.log = log;
    }

    static ServerProcess start(Path dataDir, String... extra) throws IOException, InterruptedException {
        int port;
        try (ServerSocket s = new ServerSocket(0)) {
            port = s.getLocalPort();
        }
        Path log = Files.createTempFile("coilwright-server", ".log");
        List<String> cmd = new java.util.ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m", "-cp", System.getProperty("java.class.path"), "coilwright.App",
                "--port", Integer.toString(port), "--data-dir", dataDir.toString()));
        cmd.addAll(List.of(extra));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        ServerProcess server = new ServerProcess(p, port, log);
        server.awaitHealthy();
        return server;
    }

    String url(String path) {
        return "http://127.0.0.1:" + port + path;
    }

    HttpResponse<String> get(String path) throws IOException, InterruptedException {
        return HTTP.send(HttpRequest.newBuilder(URI.create(url(path))).timeout(Duration.ofSeconds(60)).build(),
                HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<String> postJson(String path, String body) throws IOException, InterruptedException {
        return HTTP.send(HttpRequest.newBuilder(URI.create(url(path))).timeout(Duration.ofSeconds(60))
                .header("Content-Type", "application/json").POST(HttpRequest.BodyPublishers.ofString(body)).build(),
                HttpResponse.BodyHandlers.ofString());
    }

    private void awaitHealthy() throws IOException, InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(90).toNanos();
        while (System.nanoTime() < deadline) {
            if (!process.isAlive()) {
                throw new IllegalStateException("server exited with " + process.exitValue() + ": " + Files.readString(log));
            }
            try {
                if (get("/health").statusCode() == 200) {
                    return;
                }
            } catch (IOException notYet) {
                // not listening yet
            }
            Thread.sleep(100);
        }
        throw new IllegalStateException("server not healthy within 90 s: " + Files.readString(log));
    }

    /** SIGKILL on Linux: no shutdown hook runs. */
    void kill() throws InterruptedException {
        process.toHandle().destroyForcibly();
        process.waitFor();
    }

    @Override
    public void close() throws InterruptedException {
        if (process.isAlive()) {
            process.destroy();
            if (!process.waitFor(30, java.util.concurrent.TimeUnit.SECONDS)) {
                kill();
            }
        }
    }
}
