package org.nodewright.strings;

import java.util.List;
import org.nodewright.physics.strings.Material;
import org.nodewright.physics.strings.Materials;
import org.nodewright.physics.tuning.NoteNames;
import org.nodewright.web.FieldProblem;

/**
 * The per-string rules, shared by every request that describes a string: the string bench, the set
 * planner, the gauge picker and the compensation sheet. Each adds {@link FieldProblem}s to the
 * request's cross-field list ({@link org.nodewright.web.CrossFieldChecked}); {@code prefix} is ""
 * for a single string or {@code "strings[3]."} for a member of a set.
 */
public final class StringRules {

    /** Longest material id a request may carry ({@code @Size} on the material fields). */
    public static final int MATERIAL_ID_MAX = 64;
    /** Longest note name a request may carry ({@code @Size} on the note fields). */
    public static final int NOTE_MAX = 8;

    private StringRules() {
    }

    /** An id that is not in the catalogue (GET /api/v1/materials). Absent ids are left to {@code @NotNull}. */
    public static void material(List<FieldProblem> out, String field, String id) {
        if (id != null && id.length() <= MATERIAL_ID_MAX && Materials.find(id).isEmpty()) {
            out.add(new FieldProblem(field, unknownMaterial(id)));
        }
    }

    /** A wound string: the wrap material is known and comes with its diameter, and the other way round. */
    public static void wrap(List<FieldProblem> out, String prefix, String wrapMaterial, Double wrapDiameterMm) {
        material(out, prefix + "wrapMaterial", wrapMaterial);
        if (wrapMaterial != null && wrapDiameterMm == null) {
            out.add(new FieldProblem(prefix + "wrapDiameterMm", "is required when wrapMaterial is given"));
        }
        if (wrapMaterial == null && wrapDiameterMm != null) {
            out.add(new FieldProblem(prefix + "wrapMaterial", "is required when wrapDiameterMm is given"));
        }
    }

    /** A pitch given as exactly one of {@code note} (a note name) and {@code targetHz}. */
    public static void pitch(List<FieldProblem> out, String prefix, String note, Double targetHz) {
        if ((targetHz == null) == (note == null)) {
            out.add(new FieldProblem(prefix + "targetHz", "give either note or targetHz"));
        } else if (note != null && note.length() <= NOTE_MAX && !NoteNames.isNoteName(note)) {
            out.add(new FieldProblem(prefix + "note", "is not a note name like E4, F#3 or Bb2"));
        }
    }

    /** The pitch in hertz of a request that passed {@link #pitch}. */
    public static double pitchHz(String note, Double targetHz, double a4Hz) {
        return targetHz != null ? targetHz : NoteNames.frequencyHz(note, a4Hz);
    }

    /** The unknown-material message: names the id and the catalogue's ids. */
    static String unknownMaterial(String id) {
        return "is not a material of the catalogue: '" + id + "' (choose one of: "
                + String.join(", ", Materials.all().stream().map(Material::id).toList()) + ")";
    }
}
