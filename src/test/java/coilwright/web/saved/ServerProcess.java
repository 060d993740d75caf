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
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** The real server ({@code coilwright.App}) as a separate JVM with the test classpath, on a free port. */
final class ServerProcess implements AutoCloseable {
    static final HttpClient HTTP = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    /** Start-up options for short-lived servers: less JIT work and a small collector start them sooner. */
    static final List<String> QUICK_START = List.of("-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto");
    final Process process;
    final int port;
    final Path log;

    private ServerProcess(Process process, int port, Path log) {
        this.process = process;
        this.port = port;
        this.log = log;
    }

    static ServerProcess start(Path dataDir, String... extra) throws IOException, InterruptedException {
        return start(dataDir, List.of(), List.of(extra));
    }

    /** Starts the server with extra JVM options and server options, and waits until /health answers 200. */
    static ServerProcess start(Path dataDir, List<String> jvmOptions, List<String> serverOptions)
            throws IOException, InterruptedException {
        ServerProcess server = launch(dataDir, jvmOptions, serverOptions);
        server.awaitHealthy();
        return server;
    }

    /** Starts the server without waiting for it (for tests of a failed start). */
    static ServerProcess launch(Path dataDir, List<String> jvmOptions, List<String> serverOptions) throws IOException {
        int port;
        try (ServerSocket s = new ServerSocket(0)) {
            port = s.getLocalPort();
        }
        Path log = Files.createTempFile("coilwright-server", ".log");
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m"));
        cmd.addAll(jvmOptions);
        cmd.addAll(List.of("-cp", System.getProperty("java.class.path"), "coilwright.App",
                "--port", Integer.toString(port), "--data-dir", dataDir.toString(),
                // the loops' writer threads must all be admitted: a busy 503 is not an acknowledgement to count
                "--max-busy", "64"));
        cmd.addAll(serverOptions);
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        return new ServerProcess(p, port, log);
    }

    String url(String path) {
        return "http://127.0.0.1:" + port + path;
    }

    HttpResponse<String> get(String path) throws IOException, InterruptedException {
        return HTTP.send(HttpRequest.newBuilder(URI.create(url(path))).timeout(Duration.ofSeconds(60)).build(),
                HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<String> postJson(String path, String body, String... headers) throws IOException, InterruptedException {
        HttpRequest.Builder request = HttpRequest.newBuilder(URI.create(url(path))).timeout(Duration.ofSeconds(60))
                .header("Content-Type", "application/json").POST(HttpRequest.BodyPublishers.ofString(body));
        if (headers.length > 0) {
            request.headers(headers);
        }
        return HTTP.send(request.build(), HttpResponse.BodyHandlers.ofString());
    }

    String logText() {
        try {
            return Files.readString(log);
        } catch (IOException e) {
            return "(log unreadable: " + e + ")";
        }
    }

    private void awaitHealthy() throws IOException, InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(90).toNanos();
        while (System.nanoTime() < deadline) {
            if (!process.isAlive()) {
                throw new IllegalStateException("server exited with " + process.exitValue() + ": " + logText());
            }
            try {
                if (get("/health").statusCode() == 200) {
                    return;
                }
            } catch (IOException notYet) {
                // not listening yet
            }
            Thread.sleep(50);
        }
        throw new IllegalStateException("server not healthy within 90 s: " + logText());
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
            if (!process.waitFor(30, TimeUnit.SECONDS)) {
                kill();
            }
        }
        try {
            Files.deleteIfExists(log);
        } catch (IOException ignored) {
            // a temporary file; the operating system cleans up
        }
    }
}
