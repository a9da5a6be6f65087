package org.nodewright.measurements;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.nodewright.NodewrightWebTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * The 50 MB upload limit is enforced by the servlet container from the declared Content-Length,
 * before the body is read: a client that announces 60 MB and sends only 1 MB gets its 400 problem
 * document at once, so the server never buffers the whole request.
 */
@NodewrightWebTest
class UploadLimitTest {


    @LocalServerPort
    int port;

    @Test
    void aDeclaredLengthOverTheLimitIsRefusedBeforeTheBodyArrives() throws Exception {
        long declared = 60L * 1024 * 1024;
        try (Socket socket = new Socket("127.0.0.1", port)) {
            socket.setSoTimeout(20_000);
            OutputStream out = socket.getOutputStream();
            String head = "POST /api/v1/measurements/partials HTTP/1.1\r\n"
                    + "Host: 127.0.0.1\r\n"
                    + "Content-Type: multipart/form-data; boundary=XyZ\r\n"
                    + "Content-Length: " + declared + "\r\n"
                    + "Connection: close\r\n\r\n"
                    + "--XyZ\r\nContent-Disposition: form-data; name=\"file\"; filename=\"big.wav\"\r\n"
                    + "Content-Type: audio/wav\r\n\r\n";
            out.write(head.getBytes(StandardCharsets.US_ASCII));
            out.write(new byte[1024 * 1024]); // 1 MB of the 60 MB announced, then wait for the answer
            out.flush();
            String response = readAnswer(socket.getInputStream());
            assertThat(response).startsWith("HTTP/1.1 400");
            assertThat(response).contains("application/problem+json");
            assertThat(response).contains("\"field\":\"file\"").contains("upload limit");
        }
    }

    private static String readAnswer(InputStream in) throws Exception {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        byte[] chunk = new byte[8192];
        int n;
        try {
            while ((n = in.read(chunk)) > 0) {
                buf.write(chunk, 0, n);
                String s = buf.toString(StandardCharsets.UTF_8);
                if (s.contains("\r\n\r\n") && s.contains("}")) {
                    break;
                }
            }
        } catch (java.net.SocketException closedAfterAnswer) {
            // The container closes the connection rather than swallow 59 MB: the answer is already in.
        }
        return buf.toString(StandardCharsets.UTF_8);
    }
}
