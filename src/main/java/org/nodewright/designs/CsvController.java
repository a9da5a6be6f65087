package org.nodewright.designs;

import jakarta.servlet.ReadListener;
import jakarta.servlet.ServletException;
import jakarta.servlet.ServletInputStream;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletRequestWrapper;
import jakarta.servlet.http.HttpServletResponse;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * CSV of any partial, resonance, string-set or fret table. Each endpoint takes what the analysis
 * endpoint takes (or a saved design's id), runs that very endpoint inside this request (a servlet
 * include into a captured response, so validation and problem documents are the bench's own) and writes its table as CSV:
 * one row per partial, resonance, string or fret; array cells are joined with ';'.
 */
@RestController
class CsvController {

    private static final MediaType CSV = new MediaType("text", "csv", StandardCharsets.UTF_8);

    private final JsonMapper mapper;
    private final DesignLibrary library;

    CsvController(JsonMapper mapper, DesignLibrary library) {
        this.mapper = mapper;
        this.library = library;
    }

    @PostMapping(path = "/api/v1/strings/partials.csv", consumes = "application/json")
    void stringPartials(HttpServletRequest request, HttpServletResponse response) throws Exception {
        table(request, response, DesignKind.STRING, request.getInputStream().readAllBytes(), "partials.csv");
    }

    @PostMapping(path = "/api/v1/air-columns/resonances.csv", consumes = "application/json")
    void airResonances(HttpServletRequest request, HttpServletResponse response) throws Exception {
        table(request, response, DesignKind.AIR_COLUMN, request.getInputStream().readAllBytes(), "resonances.csv");
    }

    @PostMapping(path = "/api/v1/string-sets/strings.csv", consumes = "application/json")
    void stringSet(HttpServletRequest request, HttpServletResponse response) throws Exception {
        table(request, response, DesignKind.STRING_SET, request.getInputStream().readAllBytes(), "string-set.csv");
    }

    @PostMapping(path = "/api/v1/bars/modes.csv", consumes = "application/json")
    void barModes(HttpServletRequest request, HttpServletResponse response) throws Exception {
        table(request, response, DesignKind.BAR, request.getInputStream().readAllBytes(), "bar-modes.csv");
    }

    /** Same query as {@code GET /api/v1/frets}. */
    @GetMapping("/api/v1/frets.csv")
    void frets(HttpServletRequest request, HttpServletResponse response) throws Exception {
        String query = request.getQueryString() == null ? "" : "?" + request.getQueryString();
        runAndWrite(request, new BodyRequest(request, "GET", new byte[0]), response, "/api/v1/frets" + query,
                "", "frets.csv");
    }

    /** The table of a saved design: partials of a string, resonances of an air column, strings of a set. */
    @GetMapping("/api/v1/designs/{id}/csv")
    void design(@PathVariable long id, HttpServletRequest request, HttpServletResponse response) throws Exception {
        Design d = library.get(id);
        table(request, response, d.kind(), mapper.writeValueAsBytes(d.parameters()), "design-" + id + ".csv");
    }

    private void table(HttpServletRequest request, HttpServletResponse response, DesignKind kind, byte[] body,
            String filename) throws Exception {
        String rows = switch (kind) {
            case STRING -> "modes";
            case AIR_COLUMN -> "resonances";
            case STRING_SET -> "strings";
            case BAR -> "modes";
            case PLATE -> "modes";
        };
        runAndWrite(request, new BodyRequest(request, "POST", body), response, kind.analyzePath(), rows, filename);
    }

    private void runAndWrite(HttpServletRequest original, HttpServletRequest inner, HttpServletResponse response,
            String path, String rowsField, String filename) throws ServletException, IOException {
        CapturedResponse captured = new CapturedResponse(response);
        original.getRequestDispatcher(path).include(inner, captured);
        byte[] json = captured.body();
        if (captured.getStatus() != 200) {
            // The bench's own answer (a 400 problem document naming the field, a 404...) goes back as is.
            response.setStatus(captured.getStatus());
            response.setContentType(captured.getContentType() == null ? "application/problem+json"
                    : captured.getContentType());
            response.getOutputStream().write(json);
            return;
        }
        JsonNode root = mapper.readTree(json);
        JsonNode rows = rowsField.isEmpty() ? root : root.path(rowsField);
        response.setStatus(200);
        response.setContentType(CSV.toString());
        response.setHeader("Content-Disposition", "attachment; filename=\"" + filename + "\"");
        response.getOutputStream().write(toCsv(rows).getBytes(StandardCharsets.UTF_8));
    }

    /** One row per element of an array of objects; columns are the union of their fields, in order. */
    static String toCsv(JsonNode rows) {
        Set<String> columns = new LinkedHashSet<>();
        for (JsonNode row : rows) {
            for (Map.Entry<String, JsonNode> e : row.properties()) {
                columns.add(e.getKey());
            }
        }
        StringBuilder out = new StringBuilder();
        out.append(String.join(",", columns.stream().map(c -> cell(c, true)).toList())).append("\r\n");
        for (JsonNode row : rows) {
            List<String> cells = new ArrayList<>();
            for (String c : columns) {
                JsonNode v = row.get(c);
                cells.add(cell(text(v), !numeric(v)));
            }
            out.append(String.join(",", cells)).append("\r\n");
        }
        return out.toString();
    }

    /** A number, or an array of numbers only (written joined with ';'). */
    private static boolean numeric(JsonNode v) {
        if (v == null) {
            return false;
        }
        if (v.isArray()) {
            for (JsonNode x : v) {
                if (!x.isNumber()) {
                    return false;
                }
            }
            return true;
        }
        return v.isNumber();
    }

    private static String text(JsonNode v) {
        if (v == null || v.isNull()) {
            return "";
        }
        if (v.isArray()) {
            List<String> parts = new ArrayList<>();
            v.forEach(x -> parts.add(text(x)));
            return String.join(";", parts);
        }
        if (v.isObject()) {
            return v.toString();
        }
        return v.asString();
    }

    /**
     * RFC 4180 quoting; text (not a number: -3.2 stays a number) starting with =, +, -, @, a tab or a
     * carriage return gets a leading apostrophe so that a spreadsheet keeps it as text and does not
     * run it as a formula (OWASP's CSV injection advice).
     */
    private static String cell(String s, boolean text) {
        String v = s;
        if (text && !v.isEmpty() && "=+-@\t\r".indexOf(v.charAt(0)) >= 0) {
            v = "'" + v;
        }
        if (v.contains(",") || v.contains("\"") || v.contains("\n") || v.contains("\r") || v.contains(";")) {
            return "\"" + v.replace("\"", "\"\"") + "\"";
        }
        return v;
    }

    /** The inner request: the same session and security, with its own method and JSON body. */
    private static final class BodyRequest extends HttpServletRequestWrapper {

        private final String method;
        private final byte[] body;

        BodyRequest(HttpServletRequest request, String method, byte[] body) {
            super(request);
            this.method = method;
            this.body = body;
        }

        @Override
        public String getMethod() {
            return method;
        }

        @Override
        public String getContentType() {
            return "POST".equals(method) ? MediaType.APPLICATION_JSON_VALUE : null;
        }

        @Override
        public String getHeader(String name) {
            if ("Content-Type".equalsIgnoreCase(name)) {
                return getContentType();
            }
            if ("Accept".equalsIgnoreCase(name)) {
                return "application/json, application/problem+json";
            }
            return super.getHeader(name);
        }

        @Override
        public java.util.Enumeration<String> getHeaders(String name) {
            String v = getHeader(name);
            if ("Content-Type".equalsIgnoreCase(name) || "Accept".equalsIgnoreCase(name)) {
                return java.util.Collections.enumeration(v == null ? List.of() : List.of(v));
            }
            return super.getHeaders(name);
        }

        @Override
        public int getContentLength() {
            return body.length;
        }

        @Override
        public long getContentLengthLong() {
            return body.length;
        }

        @Override
        public ServletInputStream getInputStream() {
            ByteArrayInputStream in = new ByteArrayInputStream(body);
            return new ServletInputStream() {
                @Override
                public boolean isFinished() {
                    return in.available() == 0;
                }

                @Override
                public boolean isReady() {
                    return true;
                }

                @Override
                public void setReadListener(ReadListener listener) {
                    throw new UnsupportedOperationException("blocking reads only");
                }

                @Override
                public int read() {
                    return in.read();
                }

                @Override
                public int read(byte[] b, int off, int len) {
                    return in.read(b, off, len);
                }
            };
        }

        @Override
        public java.io.BufferedReader getReader() {
            return new java.io.BufferedReader(new java.io.InputStreamReader(getInputStream(), StandardCharsets.UTF_8));
        }
    }
}
