package org.nodewright.physics.templates;

import java.util.List;
import org.nodewright.physics.Require;

/**
 * A template at 1:1: its size in millimetres and the marks on it. Printing code tiles it over
 * pages; the SVG writer draws it whole.
 *
 * @param title    a short description printed on every page
 * @param widthMm  sheet width (x extent)
 * @param heightMm sheet height (y extent)
 */
public record Sheet(String title, double widthMm, double heightMm, List<Mark> marks) {

    public Sheet {
        if (title == null || title.isBlank()) {
            throw new IllegalArgumentException("sheet title must not be blank");
        }
        Require.positive("widthMm", widthMm);
        Require.positive("heightMm", heightMm);
        marks = List.copyOf(marks);
    }

    /** The marks with the given role, in drawing order. */
    public List<Mark> marks(Mark.Role role) {
        return marks.stream().filter(m -> m.role() == role).toList();
    }
}
