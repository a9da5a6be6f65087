package org.nodewright.designs;

import jakarta.servlet.ServletOutputStream;
import jakarta.servlet.WriteListener;
import jakarta.servlet.http.HttpServletResponse;
import jakarta.servlet.http.HttpServletResponseWrapper;
import java.io.ByteArrayOutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A response that keeps everything an included handler writes (status, content type, headers,
 * body) to itself and passes nothing on, so that the real response stays free for the CSV.
 */
final class CapturedResponse extends HttpServletResponseWrapper {

    private final ByteArrayOutputStream body = new ByteArrayOutputStream();
    private final Map<String, List<String>> headers = new LinkedHashMap<>();
    private int status = SC_OK;
    private String contentType;
    private PrintWriter writer;
    private ServletOutputStream stream;

    CapturedResponse(HttpServletResponse response) {
        super(response);
    }

    byte[] body() {
        if (writer != null) {
            writer.flush();
        }
        return body.toByteArray();
    }

    @Override
    public void setStatus(int sc) {
        status = sc;
    }

    @Override
    public int getStatus() {
        return status;
    }

    @Override
    public void sendError(int sc) {
        status = sc;
    }

    @Override
    public void sendError(int sc, String msg) {
        status = sc;
    }

    @Override
    public void sendRedirect(String location) {
        status = SC_FOUND;
    }

    @Override
    public void setContentType(String type) {
        contentType = type;
    }

    @Override
    public String getContentType() {
        return contentType;
    }

    @Override
    public void setCharacterEncoding(String charset) {
        // the captured body is read as UTF-8 JSON
    }

    @Override
    public String getCharacterEncoding() {
        return StandardCharsets.UTF_8.name();
    }

    @Override
    public void setContentLength(int len) {
        // not needed for a captured body
    }

    @Override
    public void setContentLengthLong(long len) {
        // not needed for a captured body
    }

    @Override
    public void setHeader(String name, String value) {
        if ("Content-Type".equalsIgnoreCase(name)) {
            contentType = value;
        }
        if (value == null) {
            headers.remove(name);
        } else {
            headers.put(name, new ArrayList<>(List.of(value)));
        }
    }

    @Override
    public void addHeader(String name, String value) {
        if (value == null) {
            return;
        }
        if ("Content-Type".equalsIgnoreCase(name)) {
            contentType = value;
        }
        headers.computeIfAbsent(name, k -> new ArrayList<>()).add(value);
    }

    @Override
    public void setIntHeader(String name, int value) {
        setHeader(name, Integer.toString(value));
    }

    @Override
    public void addIntHeader(String name, int value) {
        addHeader(name, Integer.toString(value));
    }

    @Override
    public void setDateHeader(String name, long date) {
        setHeader(name, Long.toString(date));
    }

    @Override
    public void addDateHeader(String name, long date) {
        addHeader(name, Long.toString(date));
    }

    @Override
    public boolean containsHeader(String name) {
        return headers.containsKey(name);
    }

    @Override
    public String getHeader(String name) {
        List<String> v = headers.get(name);
        return v == null || v.isEmpty() ? null : v.get(0);
    }

    @Override
    public Collection<String> getHeaders(String name) {
        return headers.getOrDefault(name, List.of());
    }

    @Override
    public Collection<String> getHeaderNames() {
        return headers.keySet();
    }

    @Override
    public ServletOutputStream getOutputStream() {
        if (stream == null) {
            stream = new ServletOutputStream() {
                @Override
                public boolean isReady() {
                    return true;
                }

                @Override
                public void setWriteListener(WriteListener listener) {
                    throw new UnsupportedOperationException("blocking writes only");
                }

                @Override
                public void write(int b) {
                    body.write(b);
                }

                @Override
                public void write(byte[] b, int off, int len) {
                    body.write(b, off, len);
                }
            };
        }
        return stream;
    }

    @Override
    public PrintWriter getWriter() {
        if (writer == null) {
            writer = new PrintWriter(new OutputStreamWriter(body, StandardCharsets.UTF_8));
        }
        return writer;
    }

    @Override
    public void flushBuffer() {
        if (writer != null) {
            writer.flush();
        }
    }

    @Override
    public boolean isCommitted() {
        return false;
    }

    @Override
    public void reset() {
        resetBuffer();
        headers.clear();
        status = SC_OK;
        contentType = null;
    }

    @Override
    public void resetBuffer() {
        if (writer != null) {
            writer.flush();
        }
        body.reset();
    }
}
