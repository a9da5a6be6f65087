package org.nodewright.templates;

import org.nodewright.physics.templates.Sheet;
import org.nodewright.templates.render.Paper;
import org.nodewright.templates.render.PdfRenderer;
import org.nodewright.templates.render.SvgRenderer;
import org.nodewright.web.BadRequestException;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;

/** SVG and PDF answers for a drawn sheet, with a download file name. */
final class TemplateResponses {

    /** The ?name= printed on a drawn template: its pattern and the message when it does not match. */
    static final String NAME = "[\\p{L}\\p{N} .,'()/+-]{1,60}";
    static final String NAME_RULE = "must be 1 to 60 letters, digits, spaces or .,'()/+-";

    static final MediaType SVG = MediaType.parseMediaType("image/svg+xml");

    private TemplateResponses() {
    }

    static ResponseEntity<String> svg(Sheet sheet, String fileStem) {
        return ResponseEntity.ok()
                .contentType(new MediaType(SVG, java.nio.charset.StandardCharsets.UTF_8))
                .header(HttpHeaders.CONTENT_DISPOSITION,
                        ContentDisposition.inline().filename(fileStem + ".svg").build().toString())
                .body(SvgRenderer.render(sheet));
    }

    static ResponseEntity<byte[]> pdf(Sheet sheet, String paperWord, String fileStem) {
        Paper paper = paper(paperWord);
        byte[] bytes;
        try {
            bytes = PdfRenderer.render(sheet, paper);
        } catch (IllegalArgumentException tooMany) {
            throw new BadRequestException("paper", tooMany.getMessage());
        }
        return ResponseEntity.ok()
                .contentType(MediaType.APPLICATION_PDF)
                .header(HttpHeaders.CONTENT_DISPOSITION,
                        ContentDisposition.attachment().filename(fileStem + "-" + paper.word() + ".pdf").build()
                                .toString())
                .body(bytes);
    }

    static Paper paper(String word) {
        return Paper.ofRequest(word);
    }
}
