package coilwright.web;

import com.fasterxml.jackson.core.JsonProcessingException;
import io.javalin.http.HttpStatus;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import org.eclipse.jetty.http.HttpField;
import org.eclipse.jetty.http.HttpFields;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.http.HttpURI;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.handler.ErrorHandler;
import org.eclipse.jetty.util.Callback;

/**
 * The answers of the web server itself, for requests refused before any route sees them (a malformed address or
 * header, headers too large, a bad HTTP version): problem+json in UTF-8 under {@code /api/}, a plain HTML page
 * elsewhere, with the {@link SecurityHeaders}, never a stack trace or the server's own page. When the address could
 * not be read at all, the answer is HTML only for a client that asked for HTML.
 */
public final class LowLevelErrors extends ErrorHandler {
    @Override
    public boolean handle(Request request, Response response, Callback callback) {
        int status = request.getAttribute(ERROR_STATUS) instanceof Integer s ? s : 500;
        String path = path(request);
        boolean api = !path.isEmpty() ? Route.isApiPath(path) : !acceptsHtml(request.getHeaders());
        response.setStatus(status);
        HttpFields.Mutable headers = response.getHeaders();
        Written w = write(status, path.isEmpty() ? null : path, api);
        headers.put(HttpHeader.CONTENT_TYPE, w.contentType());
        headers.put(HttpHeader.CACHE_CONTROL, "no-store");
        SecurityHeaders.apply(headers::put);
        response.write(true, ByteBuffer.wrap(w.bytes()), callback);
        return true;
    }

    /** Used when there is no request to answer through (the request line itself was refused). */
    @Override
    public ByteBuffer badMessageError(int status, String reason, HttpFields.Mutable fields) {
        Written w = write(status, null, true);
        fields.put(HttpHeader.CONTENT_TYPE, w.contentType());
        fields.put(HttpHeader.CACHE_CONTROL, "no-store");
        SecurityHeaders.apply(fields::put);
        return ByteBuffer.wrap(w.bytes());
    }

    private record Written(String contentType, byte[] bytes) {
    }

    private static Written write(int status, String path, boolean api) {
        String title = HttpStatus.forStatus(status).getMessage();
        if (title == null || title.isEmpty() || HttpStatus.forStatus(status) == HttpStatus.UNKNOWN) {
            title = "Error";
        }
        Problem problem = Problem.of(title.toLowerCase(java.util.Locale.ROOT).replace(' ', '-'), title, status,
                detail(status), path);
        if (api) {
            try {
                return new Written(Problem.MEDIA_TYPE + ";charset=utf-8", Json.mapper().writeValueAsBytes(problem));
            } catch (JsonProcessingException e) {
                return new Written("text/plain;charset=utf-8", title.getBytes(StandardCharsets.UTF_8));
            }
        }
        String html = "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>" + status + " "
                + title + " · Coilwright</title>\n<link rel=\"stylesheet\" href=\"/static/css/coilwright.css\">\n</head>\n"
                + "<body>\n<main id=\"content\">\n<h1>" + status + " " + title + "</h1>\n<p>" + detail(status)
                + "</p>\n<p><a href=\"/\">Coilwright home</a></p>\n</main>\n</body>\n</html>\n";
        return new Written("text/html;charset=utf-8", html.getBytes(StandardCharsets.UTF_8));
    }

    static String detail(int status) {
        return switch (status) {
            case 400 -> "The request could not be read: its address, a header or its framing is malformed.";
            case 413 -> "The request body is larger than the limit of this service.";
            case 414 -> "The address is longer than this service accepts.";
            case 431 -> "The request headers are larger than this service accepts.";
            case 501, 505 -> "This HTTP method or version is not supported.";
            default -> status >= 500 ? "The server could not answer this request." : "The request was refused.";
        };
    }

    private static String path(Request request) {
        try {
            HttpURI uri = request.getHttpURI();
            String p = uri == null ? null : uri.getPath();
            return p == null || p.equals("/badMessage") ? "" : p;
        } catch (RuntimeException e) {
            return "";
        }
    }

    private static boolean acceptsHtml(HttpFields headers) {
        if (headers == null) {
            return false;
        }
        HttpField accept = headers.getField(HttpHeader.ACCEPT);
        return accept != null && accept.getValue() != null && accept.getValue().contains("text/html");
    }
}
