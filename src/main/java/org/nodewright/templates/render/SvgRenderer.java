package org.nodewright.templates.render;

import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.nodewright.physics.templates.Mark;
import org.nodewright.physics.templates.Sheet;

/**
 * Writes a sheet as standalone SVG at 1:1: {@code width} and {@code height} in mm and a
 * {@code viewBox} whose user unit is one millimetre, so a browser or vector editor prints it at
 * true size when scaling is off.
 */
public final class SvgRenderer {

    private SvgRenderer() {
    }

    public static String render(Sheet sheet) {
        StringBuilder sb = new StringBuilder(16_384);
        sb.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\"")
                .append(" width=\"").append(n(sheet.widthMm())).append("mm\"")
                .append(" height=\"").append(n(sheet.heightMm())).append("mm\"")
                .append(" viewBox=\"0 0 ").append(n(sheet.widthMm())).append(' ').append(n(sheet.heightMm()))
                .append("\">\n");
        sb.append("<title>").append(escape(sheet.title())).append("</title>\n");
        sb.append("<rect x=\"0\" y=\"0\" width=\"").append(n(sheet.widthMm())).append("\" height=\"")
                .append(n(sheet.heightMm())).append("\" fill=\"#ffffff\"/>\n");
        sb.append("<g fill=\"none\" stroke=\"#000000\" stroke-linecap=\"butt\">\n");
        for (Mark mark : sheet.marks()) {
            if (mark instanceof Mark.Stroke s) {
                sb.append("<line x1=\"").append(n(s.x1())).append("\" y1=\"").append(n(s.y1()))
                        .append("\" x2=\"").append(n(s.x2())).append("\" y2=\"").append(n(s.y2()))
                        .append("\" stroke-width=\"").append(n(s.widthMm())).append('"');
                attributes(sb, s);
                sb.append("/>\n");
            } else if (mark instanceof Mark.Ring r) {
                sb.append("<circle cx=\"").append(n(r.cx())).append("\" cy=\"").append(n(r.cy()))
                        .append("\" r=\"").append(n(r.radiusMm())).append("\" stroke-width=\"")
                        .append(n(r.widthMm())).append('"');
                attributes(sb, r);
                sb.append("/>\n");
            }
        }
        sb.append("</g>\n<g fill=\"#000000\" stroke=\"none\" font-family=\"Helvetica, Arial, sans-serif\">\n");
        for (Mark mark : sheet.marks()) {
            if (mark instanceof Mark.Caption c) {
                sb.append("<text x=\"").append(n(c.x())).append("\" y=\"").append(n(c.y()))
                        .append("\" font-size=\"").append(n(c.sizeMm())).append("\" text-anchor=\"")
                        .append(anchor(c.anchor())).append('"');
                attributes(sb, c);
                sb.append('>').append(escape(c.text())).append("</text>\n");
            }
        }
        sb.append("</g>\n</svg>\n");
        return sb.toString();
    }

    private static void attributes(StringBuilder sb, Mark mark) {
        sb.append(" class=\"").append(mark.role().name().toLowerCase(Locale.ROOT).replace('_', '-')).append('"');
        for (Map.Entry<String, String> e : new TreeMap<>(mark.data()).entrySet()) {
            sb.append(" data-").append(e.getKey()).append("=\"").append(escape(e.getValue())).append('"');
        }
    }

    private static String anchor(Mark.Caption.Anchor a) {
        return switch (a) {
            case START -> "start";
            case MIDDLE -> "middle";
            case END -> "end";
        };
    }

    /** Millimetres with 4 decimals (0.1 µm, far below any printer's resolution), no trailing zeros. */
    static String n(double v) {
        String s = String.format(Locale.ROOT, "%.4f", v);
        s = s.indexOf('.') >= 0 ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
        return "-0".equals(s) ? "0" : s;
    }

    static String escape(String text) {
        StringBuilder sb = new StringBuilder(text.length());
        for (char ch : text.toCharArray()) {
            switch (ch) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> {
                    if (ch >= 0x20 || ch == '\t') {
                        sb.append(ch);
                    }
                }
            }
        }
        return sb.toString();
    }
}
