package org.nodewright.bars;

import static org.nodewright.physics.Units.MM;

import java.util.List;
import org.nodewright.physics.bars.Bar;
import org.nodewright.physics.bars.BarMaterial;
import org.nodewright.physics.bars.BarMaterials;
import org.nodewright.physics.bars.BarSection;
import org.nodewright.physics.bars.RectangleSection;
import org.nodewright.physics.bars.RoundSection;
import org.nodewright.physics.bars.ThicknessProfile;
import org.nodewright.physics.bars.TubeSection;

/** The one mapping from a validated bar request (mm) to the core's {@link Bar} (SI). */
public final class BarMapper {

    private BarMapper() {
    }

    public static Bar toBar(BarAnalysisRequest r) {
        double length = r.lengthMm() * MM;
        BarMaterial m = r.material() == null ? null : BarMaterials.byId(r.material()).orElseThrow();
        double rho = r.densityKgPerM3() != null ? r.densityKgPerM3() : m.density();
        double e = r.youngsModulusPa() != null ? r.youngsModulusPa() : m.youngsModulus();
        double g = r.shearModulusPa() != null ? r.shearModulusPa() : m.shearModulus();
        return new Bar(length, section(r, length), rho, e, g, r.endsOrDefault());
    }

    static BarSection section(BarAnalysisRequest r, double length) {
        return switch (r.section()) {
            case RECTANGLE -> new RectangleSection(r.widthMm() * MM, profile(r.profile(), r.thicknessMm(), length));
            case ROUND -> new RoundSection(r.diameterMm() * MM);
            case TUBE -> new TubeSection(r.diameterMm() * MM, r.boreMm() * MM);
        };
    }

    /** The profile in metres; its last point is the bar's length (validation allows 1e-6 mm of rounding). */
    static ThicknessProfile profile(List<BarAnalysisRequest.ProfilePoint> points, Double thicknessMm, double length) {
        if (points == null) {
            return ThicknessProfile.uniform(length, thicknessMm * MM);
        }
        int n = points.size();
        double[] x = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = points.get(i).positionMm() * MM;
            t[i] = points.get(i).thicknessMm() * MM;
        }
        x[n - 1] = length;
        return ThicknessProfile.of(x, t);
    }
}
