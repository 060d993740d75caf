package coilwright.web.saved;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * A loopback TCP proxy in front of a server (here PostgreSQL), for fault tests: {@link #cut()} closes the listening
 * socket and every open connection, as a lost database or network would; {@link #restore()} listens again on the
 * same port.
 */
final class TcpProxy implements AutoCloseable {
    private final int targetPort;
    private final int port;
    private final List<Socket> open = new CopyOnWriteArrayList<>();
    private volatile ServerSocket listener;

    TcpProxy(int targetPort) throws IOException {
        this.targetPort = targetPort;
        this.listener = listen(0);
        this.port = listener.getLocalPort();
        accept(listener);
    }

    int port() {
        return port;
    }

    /** Refuses new connections and resets every open one. */
    synchronized void cut() throws IOException {
        listener.close();
        for (Socket s : open) {
            try {
                s.setSoLinger(true, 0);
            } catch (IOException alreadyClosed) {
                // its pump closed it a moment ago
            }
            closeQuietly(s);
        }
        open.clear();
    }

    /** Accepts connections again, on the same port. */
    synchronized void restore() throws IOException {
        listener = listen(port);
        accept(listener);
    }

    @Override
    public void close() throws IOException {
        cut();
    }

    private static ServerSocket listen(int port) throws IOException {
        ServerSocket s = new ServerSocket();
        s.setReuseAddress(true);
        s.bind(new InetSocketAddress(InetAddress.getLoopbackAddress(), port));
        return s;
    }

    private void accept(ServerSocket server) {
        daemon("proxy-accept-" + port, () -> {
            while (!server.isClosed()) {
                Socket client;
                try {
                    client = server.accept();
                } catch (IOException closed) {
                    return;
                }
                try {
                    Socket upstream = new Socket(InetAddress.getLoopbackAddress(), targetPort);
                    open.add(client);
                    open.add(upstream);
                    daemon("proxy-up", () -> pump(client, upstream));
                    daemon("proxy-down", () -> pump(upstream, client));
                } catch (IOException targetDown) {
                    closeQuietly(client);
                }
            }
        });
    }

    private void pump(Socket from, Socket to) {
        byte[] buffer = new byte[16 * 1024];
        try (InputStream in = from.getInputStream(); OutputStream out = to.getOutputStream()) {
            for (int n; (n = in.read(buffer)) >= 0; ) {
                out.write(buffer, 0, n);
                out.flush();
            }
        } catch (IOException ended) {
            // one side closed or was cut; closing both below ends the other pump too
        } finally {
            closeQuietly(from);
            closeQuietly(to);
            open.remove(from);
            open.remove(to);
        }
    }

    private static void closeQuietly(Socket s) {
        try {
            s.close();
        } catch (IOException ignored) {
            // already closed
        }
    }

    private static void daemon(String name, Runnable r) {
        Thread t = new Thread(r, name);
        t.setDaemon(true);
        t.start();
    }
}
