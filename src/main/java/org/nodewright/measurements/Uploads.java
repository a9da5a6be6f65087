package org.nodewright.measurements;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.nodewright.physics.measure.MonoRecording;
import org.nodewright.physics.measure.PeakFinder;
import org.nodewright.physics.measure.SpectralPeak;
import org.nodewright.physics.measure.UnreadableInputException;
import org.nodewright.physics.measure.WavReader;
import org.nodewright.web.BadRequestException;
import org.springframework.web.multipart.MultipartFile;

/**
 * The one way an uploaded file (multipart part {@code file}) is read by every bench: its bytes, its UTF-8 text,
 * a WAV recording and its spectral peaks. Anything unreadable becomes a 400 naming {@code file}.
 */
public final class Uploads {

    /** The file part's limit, as in spring.servlet.multipart.max-file-size. */
    public static final long MAX_FILE_BYTES = 50L * 1024 * 1024;

    private Uploads() {
    }

    /** A read of the uploaded file that may fail. */
    public interface Reading<T> {
        T read() throws IOException;
    }

    /** Runs a read of the uploaded file; anything unreadable becomes a 400 on the field {@code file}. */
    public static <T> T read(Reading<T> reading) {
        try {
            return reading.read();
        } catch (UnreadableInputException e) {
            throw new BadRequestException("file", e.getMessage());
        } catch (IOException e) {
            throw new BadRequestException("file", "the upload could not be read");
        }
    }

    /** The recording in a WAV upload. */
    public static MonoRecording recording(MultipartFile file) {
        return read(() -> WavReader.read(bytes(file)));
    }

    /** The {@code count} strongest spectral peaks of a WAV upload ({@link PeakFinder}). */
    public static List<SpectralPeak> peaks(MultipartFile file, int count) {
        MonoRecording recording = recording(file);
        return read(() -> PeakFinder.find(recording, count));
    }

    static byte[] bytes(MultipartFile file) throws IOException {
        if (file.isEmpty()) {
            throw new UnreadableInputException("the file is empty");
        }
        if (file.getSize() > MAX_FILE_BYTES) {
            throw new UnreadableInputException("the file is larger than the upload limit of 50 MB");
        }
        return file.getBytes();
    }

    static String text(MultipartFile file) throws IOException {
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes(file)))
                    .toString();
        } catch (CharacterCodingException e) {
            throw new UnreadableInputException("not a UTF-8 text table");
        }
    }
}
