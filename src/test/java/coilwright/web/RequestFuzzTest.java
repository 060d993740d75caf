package coilwright.web;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import coilwright.App;
import coilwright.web.match.MatchApiTest;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Provide;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.Tag;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.lifecycle.AfterContainer;
import net.jqwik.api.lifecycle.BeforeContainer;

/**
 * Hostile and careless requests against the real server: every route and method of the OpenAPI document and every
 * page of the route table, with malformed JSON, wrong types, NaN and Infinity as strings and as tokens, huge and tiny
 * numbers, unicode, deep nesting, huge arrays, oversize bodies, unknown enum values and fields, wrong content types
 * and garbage ids and query strings, sent as raw bytes so that even an address no client library would write gets
 * through. Expected: no 5xx at all; under {@code /api/} every refusal is problem+json whose detail is in our own
 * words; elsewhere an HTML page without internals. Counts by route and status are printed at the end.
 */
@Tag("slow")
class RequestFuzzTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Pattern CLASS_NAME = Pattern.compile(
            "\\b(java|javax|jakarta|com|org|io|kotlin|coilwright)\\.[a-z]+(\\.[A-Za-z_$][\\w$]*)+");
    private static final List<String> FORBIDDEN = List.of("Exception", "com.fasterxml", "jackson", "JsonReadFeature");
    private static final Map<String, AtomicInteger> COUNTS = new ConcurrentHashMap<>();

    private static App app;
    private static Path dataDir;
    private static List<String[]> routes;
    private static Map<String, String> ids;
    private static List<JsonNode> validBodies;
    private static Map<String, JsonNode> bases;

    @BeforeContainer
    static void start() throws IOException {
        dataDir = Files.createTempDirectory("coilwright-fuzz-");
        app = App.create(AppConfig.defaults().withPort(0).withDataDir(dataDir)).start("127.0.0.1", 0);
        JsonNode doc = JSON.readTree(send("GET", "/api/v1/openapi.json", null, new byte[0]).body);
        routes = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = doc.get("paths").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> path = it.next();
            path.getValue().fieldNames().forEachRemaining(m -> {
                if (List.of("get", "post", "put", "delete", "patch").contains(m)) {
                    routes.add(new String[] {m.toUpperCase(Locale.ROOT), path.getKey()});
                }
            });
        }
        for (Route r : app.routes()) {
            if (!Route.isApiPath(r.path())) {
                routes.add(new String[] {r.method().name(), r.path()});
            }
        }
        routes.add(new String[] {"GET", "/static/css/coilwright.css"});
        routes.add(new String[] {"GET", "/api/v1/no-such-route"});
        ids = demoIds();
        validBodies = new ArrayList<>();
        for (String slug : List.of("axial-wind-48v", "radial-hydro-48v", "rewound-motor-12v")) {
            JsonNode example = example(slug);
            validBodies.add(example);
            validBodies.add(example.get("design"));
        }
        validBodies.add(MatchApiTest.windBody());
        validBodies.add(MatchApiTest.hydroBody());
        validBodies.add(coilwright.web.rewind.Bodies.request());
        bases = Map.of("match/wind", MatchApiTest.windBody(), "match/hydro", MatchApiTest.hydroBody(),
                "document", example("axial-wind-48v"), "design", example("radial-hydro-48v").get("design"),
                "winding", example("axial-wind-48v").get("design").get("alternator").get("winding"),
                "rewind", coilwright.web.rewind.Bodies.request());
    }

    /** A valid body of the kind the route takes (or one of another kind, now and then). */
    private static JsonNode base(String route, Random random) {
        if (random.nextInt(5) == 0) {
            return validBodies.get(random.nextInt(validBodies.size()));
        }
        if (route.contains("match/wind")) {
            return bases.get("match/wind");
        }
        if (route.contains("match/hydro")) {
            return bases.get("match/hydro");
        }
        if (route.endsWith("/rewind")) {
            return bases.get("rewind");
        }
        if (route.contains("designs") || route.contains("saved") || route.contains("revise")) {
            return bases.get("document");
        }
        if (route.endsWith("/winding")) {
            return bases.get("winding");
        }
        return validBodies.get(1 + 2 * random.nextInt(3)); // the three example designs
    }

    @AfterContainer
    static void stop() throws IOException {
        Map<String, Integer> sorted = new TreeMap<>();
        COUNTS.forEach((k, v) -> sorted.put(k, v.get()));
        StringBuilder report = new StringBuilder("fuzz requests by route and status (")
                .append(sorted.values().stream().mapToInt(Integer::intValue).sum()).append(" in all):\n");
        sorted.forEach((k, v) -> report.append(String.format("  %6d  %s%n", v, k)));
        System.out.println(report);
        if (app != null) {
            app.stop();
        }
        try (Stream<Path> paths = Files.walk(dataDir)) {
            paths.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    @Property(tries = 10_000, shrinking = ShrinkingMode.OFF)
    void no_request_gets_a_5xx_and_every_refusal_is_in_our_own_words(
            @ForAll @IntRange(min = 0, max = 99) int methodDice,
            @ForAll @IntRange(min = 0, max = 99) int idDice,
            @ForAll @IntRange(min = 0, max = 99) int queryDice,
            @ForAll @IntRange(min = 0, max = 99) int bodyDice,
            @ForAll @IntRange(min = 0, max = 99) int typeDice,
            @ForAll("salts") long salt) throws IOException {
        Random random = new Random(salt);
        String[] r = routes.get(random.nextInt(routes.size()));
        String method = methodDice < 80 ? r[0] : pick(random, "GET", "POST", "PUT", "DELETE", "PATCH", "OPTIONS");
        String path = fillIds(r[1], idDice, random) + query(queryDice, random);
        byte[] body = method.equals("GET") && bodyDice < 70 ? new byte[0] : body(bodyDice, random, r[1]);
        String type = contentType(typeDice, r[1], random);
        if (bodyDice >= 12 && bodyDice < 40 && typeDice % 4 != 0) {
            type = Route.isApiPath(r[1]) ? "application/json" : "application/x-www-form-urlencoded";
        }
        Answer a = send(method, path, type, body);
        String key = r[0] + " " + r[1] + " -> " + a.status;
        COUNTS.computeIfAbsent(key, k -> new AtomicInteger()).incrementAndGet();
        String what = method + " " + abbreviate(path) + " [" + type + ", " + body.length + " bytes] -> " + a.status;
        assertTrue(a.status >= 200 && a.status < 500, what + ": " + abbreviate(a.text()));
        boolean api = Route.isApiPath(r[1]) && !path.startsWith("/static");
        if (a.status >= 400 && api) {
            String ctype = a.header("content-type");
            assertTrue(ctype.startsWith("application/problem+json"), what + ": content type " + ctype);
            JsonNode problem = JSON.readTree(a.body);
            String detail = problem.path("detail").asText("") + " " + problem.path("errors").toString();
            for (String word : FORBIDDEN) {
                assertFalse(detail.toLowerCase(Locale.ROOT).contains(word.toLowerCase(Locale.ROOT)),
                        what + ": detail names " + word + ": " + abbreviate(detail));
            }
            assertFalse(CLASS_NAME.matcher(detail).find(), what + ": detail names a class: " + abbreviate(detail));
        } else if (a.status >= 400 && !method.equals("HEAD")) {
            if (a.header("content-type").startsWith("application/problem+json")
                    && !JSON.readTree(a.body).has("instance")) {
                return; // the address itself could not be read: the server cannot know it was a page
            }
            assertTrue(a.header("content-type").startsWith("text/html"), what + ": " + a.header("content-type"));
            assertFalse(a.text().contains("Exception") || a.text().contains("\tat "), what + ": internals in the page");
        }
    }

    /** Seeds of the per-request choices, without jqwik's edge cases (0, ±1, extremes), which would repeat one request. */
    @Provide
    Arbitrary<Long> salts() {
        return Arbitraries.longs().withoutEdgeCases();
    }

    // ---- what is sent ----

    private static String fillIds(String template, int dice, Random random) {
        String design = dice < 40 ? ids.get("designId") : garbageId(random);
        String revision = dice < 40 ? ids.get("revisionId") : garbageId(random);
        String slug = dice < 40 ? ids.get("slug") : garbageId(random);
        return template.replace("{designId}", design).replace("{revisionId}", revision).replace("{slug}", slug);
    }

    private static String garbageId(Random random) {
        return pick(random, "x", "0", "-1", "AAAAAAAAAAAAAAAAAAAAAA", "%zz", "%00", "%2e%2e%2f%2e%2e", "..", "%C3%A9t%C3%A9",
                "%F0%9F%98%80", "' OR '1'='1", "%3Cscript%3E", "a".repeat(300), "a".repeat(5000), "%", "%ff%fe",
                "r0b5fntHkziTVInv-xSX9A", "null", "1e308", "%20", "\u0001", "a;b", "a%0d%0aSet-Cookie:x");
    }

    private static String query(int dice, Random random) {
        if (dice < 50) {
            return "";
        }
        String v = pick(random, "", "x", "NaN", "Infinity", "-1", "1e999", "%zz", "%00", "%F0%9F%98%80", "a".repeat(3000),
                ids.get("revisionId"), ids.get("slug"), "imperial", "metric", "%26%3D", "[]", "{}");
        String name = pick(random, "example", "a", "b", "units", "slots", "poles", "phases", "layers", "q", "%zz",
                "alternator.winding.slots", "", "a[0]", "coils[9999999].turns");
        return "?" + name + "=" + v + (random.nextBoolean() ? "&" + name + "=" + v + "&b=" + v : "");
    }

    private static String contentType(int dice, String route, Random random) {
        if (dice < 55) {
            return Route.isApiPath(route) ? "application/json" : "application/x-www-form-urlencoded";
        }
        return pick(random, null, "application/json", "application/json; charset=utf-8", "text/plain",
                "application/x-www-form-urlencoded", "multipart/form-data", "multipart/form-data; boundary=zz",
                "application/xml", "garbage/////", "application/problem+json", "application/json; charset=latin-1",
                "multipart/mixed; boundary=x", ";;;", "application/vnd.x+json");
    }

    private static byte[] body(int dice, Random random, String route) {
        String text;
        if (dice < 40 && !Route.isApiPath(route)) {
            JsonNode changed = dice < 12 ? mutated(base(route, random), random) : perturbed(base(route, random), random);
            text = form(changed, random);
        } else if (dice < 12) {
            text = mutated(base(route, random), random).toString();
        } else if (dice < 40) {
            text = perturbed(base(route, random), random).toString();
        } else if (dice < 45) {
            text = pick(random, "", "{", "}", "[1,2", "{\"a\":NaN}", "{\"a\":Infinity}", "{\"a\":-Infinity}",
                    "{\"a\":1,}", "{'a':1}", "{\"a\":01}", "{\"a\":.5}", "{\"a\":1e99999}", "nul", "tru",
                    "\"unterminated", "{\"a\":\"\\u00\"}", "{\"a\" 1}", "/* c */ {}", "{\"a\":1}{\"b\":2}",
                    "\uFEFF{}", "{\"\u0000\":1}", "[]", "\"text\"", "123", "null", "true", "{\"type\":\"Nope\"}");
        } else if (dice < 48) {
            int depth = pick(random, 10, 100, 1000, 5000, 100_000);
            text = "[".repeat(depth) + "]".repeat(random.nextBoolean() ? depth : depth / 2);
        } else if (dice < 51) {
            int depth = pick(random, 10, 500, 2000, 20_000);
            text = "{\"a\":".repeat(depth) + "1" + "}".repeat(depth);
        } else if (dice < 55) {
            int n = pick(random, 1000, 10_000, 100_000, 300_000);
            StringBuilder b = new StringBuilder("{\"alternator\":[");
            for (int i = 0; i < n; i++) {
                b.append(i == 0 ? "" : ",").append(random.nextInt(10));
            }
            text = b.append("]}").toString();
        } else if (dice < 58) {
            text = "{\"title\":\"" + "x".repeat((int) AppConfig.DEFAULT_MAX_BODY_BYTES + random.nextInt(100_000)) + "\"}";
        } else if (dice < 70) {
            text = form(base(route, random), random);
        } else if (dice < 75) {
            text = multipart(random);
        } else if (dice < 80) {
            byte[] bytes = new byte[random.nextInt(2000)];
            random.nextBytes(bytes);
            return bytes;
        } else {
            text = wrongShapes(random).toString();
        }
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /** A valid body with one leaf, one object or one list replaced by something it must not be. */
    private static JsonNode mutated(JsonNode valid, Random random) {
        JsonNode body = valid.deepCopy();
        int edits = 1 + random.nextInt(3);
        for (int i = 0; i < edits; i++) {
            List<JsonNode[]> slots = new ArrayList<>();
            collect(body, slots);
            if (slots.isEmpty()) {
                break;
            }
            JsonNode[] slot = slots.get(random.nextInt(slots.size()));
            JsonNode replacement = weird(random);
            if (slot[0] instanceof ObjectNode o) {
                List<String> names = new ArrayList<>();
                o.fieldNames().forEachRemaining(names::add);
                String name = names.get(random.nextInt(names.size()));
                switch (random.nextInt(4)) {
                    case 0 -> o.remove(name);
                    case 1 -> o.set("unknown" + random.nextInt(3), replacement);
                    default -> o.set(name, replacement);
                }
            } else if (slot[0] instanceof ArrayNode a && a.size() > 0) {
                a.set(random.nextInt(a.size()), replacement);
            }
        }
        return body;
    }

    /** A valid body with one to three numbers scaled to extremes that may still be admitted. */
    private static JsonNode perturbed(JsonNode valid, Random random) {
        JsonNode body = valid.deepCopy();
        List<JsonNode[]> parents = new ArrayList<>();
        collect(body, parents);
        int edits = 1 + random.nextInt(3);
        for (int i = 0; i < edits && !parents.isEmpty(); i++) {
            JsonNode parent = parents.get(random.nextInt(parents.size()))[0];
            if (parent instanceof ObjectNode o) {
                List<String> numeric = new ArrayList<>();
                o.fields().forEachRemaining(e -> {
                    if (e.getValue().isNumber()) {
                        numeric.add(e.getKey());
                    }
                });
                if (!numeric.isEmpty()) {
                    String name = numeric.get(random.nextInt(numeric.size()));
                    double v = o.get(name).asDouble();
                    double factor = pick(random, 0.0, 1e-200, Double.MIN_VALUE, 1e-12, 1e-6, 1e-3, 0.1,
                            0.5, 0.9, 0.99, 1.01, 1.1, 2.0, 10.0, 1e3, 1e6, 1e12, 1e200, -1.0);
                    double next = v == 0 ? pick(random, Double.MIN_VALUE, 1e-200, 1e-12, 1e-9, 1e-6, 1.0, 1e9, -1.0) : v * factor;
                    if (o.get(name).isIntegralNumber() && Math.abs(next) < 1e15) {
                        o.put(name, Math.round(next));
                    } else {
                        o.put(name, next);
                    }
                }
            }
        }
        return body;
    }

    private static void collect(JsonNode node, List<JsonNode[]> out) {
        if (node.isContainerNode() && node.size() > 0) {
            out.add(new JsonNode[] {node});
            node.elements().forEachRemaining(child -> collect(child, out));
        }
    }

    private static JsonNode weird(Random random) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        return switch (random.nextInt(24)) {
            case 0 -> f.textNode("NaN");
            case 1 -> f.textNode("Infinity");
            case 2 -> f.numberNode(1e308);
            case 3 -> f.numberNode(-1e308);
            case 4 -> f.numberNode(Double.MIN_VALUE);
            case 5 -> f.numberNode(1e-200);
            case 6 -> f.numberNode(-1e-12);
            case 7 -> f.numberNode(0);
            case 8 -> f.numberNode(Long.MAX_VALUE);
            case 9 -> f.numberNode(Integer.MIN_VALUE);
            case 10 -> f.numberNode(new java.math.BigInteger("9".repeat(400)));
            case 11 -> f.numberNode(new java.math.BigDecimal("1e-400"));
            case 12 -> f.textNode("é😀\u202E\u0000");
            case 13 -> f.textNode("<script>alert(1)</script>");
            case 14 -> f.textNode("NO_SUCH_VALUE");
            case 15 -> f.nullNode();
            case 16 -> f.booleanNode(true);
            case 17 -> f.objectNode();
            case 18 -> f.arrayNode();
            case 19 -> {
                ArrayNode many = f.arrayNode();
                int n = 201 + random.nextInt(5000);
                for (int i = 0; i < n; i++) {
                    many.add(random.nextDouble());
                }
                yield many;
            }
            case 20 -> f.objectNode().put("type", "NoSuchType");
            case 21 -> f.numberNode(random.nextGaussian() * Math.pow(10, random.nextInt(40) - 20));
            case 22 -> f.numberNode(random.nextInt(2000) - 1000);
            default -> f.textNode("x".repeat(random.nextInt(10_000)));
        };
    }

    private static JsonNode wrongShapes(Random random) {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        for (String name : List.of("alternator", "load", "speedRange", "design", "rotor", "site", "wind", "runner",
                "penstock", "title", "notes", "schemaVersion", "winding", "measurements")) {
            if (random.nextBoolean()) {
                o.set(name, weird(random));
            }
        }
        return o;
    }

    private static String form(JsonNode valid, Random random) {
        List<String> names = new ArrayList<>();
        flatten(valid, "", names);
        StringBuilder b = new StringBuilder();
        for (String pair : names) {
            String name = pair.substring(0, pair.indexOf('='));
            String value = random.nextInt(6) == 0 ? pick(random, "", "NaN", "Infinity", "-1", "1e999", "%zz", "abc",
                    "%F0%9F%98%80", "0", "1e-300", "99999999999999999999", "%00")
                    : java.net.URLEncoder.encode(pair.substring(pair.indexOf('=') + 1), StandardCharsets.UTF_8);
            b.append(b.length() == 0 ? "" : "&").append(name).append('=').append(value);
        }
        if (random.nextBoolean()) {
            b.append("&coils[").append(random.nextInt(Integer.MAX_VALUE)).append("].turns=3&%zz=%zz&=&&a");
        }
        if (random.nextInt(5) == 0) {
            b.append("&document=").append(random.nextBoolean() ? "%7B" : "x".repeat(random.nextInt(5000)));
        }
        return b.toString();
    }

    private static void flatten(JsonNode node, String path, List<String> out) {
        if (node.isObject()) {
            node.fields().forEachRemaining(e -> flatten(e.getValue(), path.isEmpty() ? e.getKey() : path + "." + e.getKey(), out));
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                flatten(node.get(i), path + "[" + i + "]", out);
            }
        } else {
            out.add(path + "=" + node.asText());
        }
    }

    private static String multipart(Random random) {
        String part = random.nextBoolean() ? validBodies.get(0).toString() : "{\"title\":1}";
        return pick(random, "x", "--zz\r\n", "--zz\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.json\"\r\n\r\n"
                + part + "\r\n--zz--\r\n", "--zz\r\nContent-Disposition: form-data; name=\"document\"\r\n\r\n" + part
                + "\r\n--zz--\r\n", "--zz\r\nContent-Disposition: form-data\r\n\r\nx\r\n--zz");
    }

    @SafeVarargs
    private static <T> T pick(Random random, T... choices) {
        return choices[random.nextInt(choices.length)];
    }

    private static String abbreviate(String s) {
        return s.length() > 300 ? s.substring(0, 300) + "..." : s;
    }

    // ---- a raw HTTP/1.1 client ----

    record Answer(int status, Map<String, String> headers, byte[] body) {
        String header(String name) {
            return headers.getOrDefault(name, "");
        }

        String text() {
            return new String(body, StandardCharsets.UTF_8);
        }
    }

    static Answer send(String method, String target, String contentType, byte[] body) throws IOException {
        try (Socket s = new Socket("127.0.0.1", app.port())) {
            s.setSoTimeout(60_000);
            StringBuilder head = new StringBuilder(method).append(' ').append(target).append(" HTTP/1.1\r\n")
                    .append("Host: 127.0.0.1\r\nConnection: close\r\n");
            if (contentType != null) {
                head.append("Content-Type: ").append(contentType).append("\r\n");
            }
            if (body.length > 0 || method.equals("POST")) {
                head.append("Content-Length: ").append(body.length).append("\r\n");
            }
            head.append("\r\n");
            OutputStream out = s.getOutputStream();
            out.write(head.toString().getBytes(StandardCharsets.UTF_8));
            try {
                out.write(body);
                out.flush();
            } catch (IOException refusedEarly) {
                // the server may answer (413) and close before reading a large body: read its answer
            }
            return parse(s.getInputStream());
        }
    }

    private static Answer parse(InputStream in) throws IOException {
        byte[] all = readAll(in);
        int end = indexOf(all, "\r\n\r\n".getBytes(StandardCharsets.ISO_8859_1), 0);
        if (end < 0) {
            throw new IOException("no complete answer: " + new String(all, StandardCharsets.ISO_8859_1));
        }
        String[] lines = new String(all, 0, end, StandardCharsets.ISO_8859_1).split("\r\n");
        int status = Integer.parseInt(lines[0].split(" ")[1]);
        Map<String, String> headers = new TreeMap<>();
        for (int i = 1; i < lines.length; i++) {
            int colon = lines[i].indexOf(':');
            headers.put(lines[i].substring(0, colon).strip().toLowerCase(Locale.ROOT), lines[i].substring(colon + 1).strip());
        }
        byte[] body = java.util.Arrays.copyOfRange(all, end + 4, all.length);
        if ("chunked".equalsIgnoreCase(headers.get("transfer-encoding"))) {
            body = unchunk(body);
        }
        if (status == 100) {
            return parse(new java.io.ByteArrayInputStream(body));
        }
        return new Answer(status, headers, body);
    }

    private static byte[] readAll(InputStream in) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] buf = new byte[16384];
        try {
            for (int n; (n = in.read(buf)) >= 0; ) {
                out.write(buf, 0, n);
            }
        } catch (java.net.SocketException reset) {
            // a reset after the answer (the server closed on an unread body): keep what arrived
            if (out.size() == 0) {
                throw reset;
            }
        }
        return out.toByteArray();
    }

    private static byte[] unchunk(byte[] chunked) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int at = 0;
        while (at < chunked.length) {
            int eol = indexOf(chunked, new byte[] {'\r', '\n'}, at);
            String size = new String(chunked, at, eol - at, StandardCharsets.ISO_8859_1).split(";")[0].strip();
            int n = Integer.parseInt(size, 16);
            if (n == 0) {
                break;
            }
            out.write(chunked, eol + 2, n);
            at = eol + 2 + n + 2;
        }
        return out.toByteArray();
    }

    private static int indexOf(byte[] data, byte[] pattern, int from) {
        outer:
        for (int i = from; i <= data.length - pattern.length; i++) {
            for (int j = 0; j < pattern.length; j++) {
                if (data[i + j] != pattern[j]) {
                    continue outer;
                }
            }
            return i;
        }
        return -1;
    }

    private static JsonNode example(String slug) {
        try (InputStream in = RequestFuzzTest.class.getClassLoader().getResourceAsStream("examples/" + slug + ".json")) {
            return JSON.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Map<String, String> demoIds() throws IOException {
        long until = System.nanoTime() + 60_000_000_000L;
        while (System.nanoTime() < until) {
            JsonNode demos = JSON.readTree(send("GET", "/api/v1/demos", null, new byte[0]).body);
            if (demos.size() > 0) {
                JsonNode d = demos.get(0);
                return Map.of("designId", d.get("designId").asText(), "revisionId", d.get("latestRevisionId").asText(),
                        "slug", d.get("slug").asText());
            }
            try {
                Thread.sleep(100);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                break;
            }
        }
        throw new IllegalStateException("no demo design after 60 s");
    }
}
