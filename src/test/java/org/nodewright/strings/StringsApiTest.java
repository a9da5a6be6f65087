package org.nodewright.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/** The strings API answers well-formed requests with the contract's fields and values. */
@StoreFreeWebTest
class StringsApiTest {


    @Autowired
    MockMvc mvc;

    private final ObjectMapper json = new ObjectMapper();

    private JsonNode postJson(String path, String body) throws Exception {
        String text = mvc.perform(post(path).contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
        return json.readTree(text);
    }

    private JsonNode getJson(String path) throws Exception {
        return json.readTree(mvc.perform(get(path)).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString());
    }

    @Test
    void contractExampleMatchesFletchersPinnedFormula() throws Exception {
        JsonNode r = postJson("/api/v1/strings/analyze", """
                {"lengthMm": 650.0, "tensionN": 70.0, "targetHz": null, "linearDensityKgPerM": null,
                 "material": "plain-steel", "diameterMm": 0.30, "wrapMaterial": null, "wrapDiameterMm": null,
                 "youngsModulusPa": null, "endCondition": "pinned", "stiffness": true, "modeCount": 12,
                 "pluck": {"positionMm": 120.0, "kind": "pluck"},
                 "pickups": [{"positionMm": 150.0, "apertureMm": 0.0}]}""");
        // Independent of the server: μ = ρπd²/4 (catalogue ρ = 7850), f0 = √(T/μ)/(2L),
        // B = π³Ed⁴/(64TL²) (Fletcher 1964), f_n = n·f0·√(1+Bn²).
        double mu = 7850 * Math.PI * 0.30e-3 * 0.30e-3 / 4;
        double f0 = Math.sqrt(70 / mu) / (2 * 0.65);
        double b = Math.pow(Math.PI, 3) * 200e9 * Math.pow(0.30e-3, 4) / (64 * 70 * 0.65 * 0.65);
        assertThat(r.path("linearDensityKgPerM").asDouble()).isCloseTo(mu, within(mu * 1e-12));
        assertThat(r.path("inharmonicityB").asDouble()).isCloseTo(b, within(b * 1e-9));
        assertThat(r.path("fundamentalHz").asDouble()).isCloseTo(f0 * Math.sqrt(1 + b), within(1e-9));
        assertThat(r.path("modes")).hasSize(12);
        JsonNode m3 = r.path("modes").get(2);
        assertThat(m3.path("frequencyHz").asDouble()).isCloseTo(3 * f0 * Math.sqrt(1 + 9 * b), within(1e-8));
        assertThat(m3.path("harmonicHz").asDouble()).isCloseTo(3 * f0, within(1e-9));
        assertThat(m3.path("nodesMm").get(1).asDouble()).isCloseTo(650.0 / 3, within(1e-9));
        assertThat(m3.path("antinodesMm").get(0).asDouble()).isCloseTo(650.0 / 6, within(1e-9));
        assertThat(m3.path("nodesFromBridgeMm").get(1).asDouble()).isCloseTo(650.0 / 3, within(1e-9));
        // Textbook pluck series and point pickup on a sine.
        double bn = 2 * 0.65 * 0.65 / (9 * Math.PI * Math.PI * 0.12 * 0.53) * Math.sin(3 * Math.PI * 120 / 650);
        assertThat(m3.path("excitation").asDouble()).isCloseTo(bn, within(1e-12));
        assertThat(m3.path("pickupResponse").get(0).asDouble()).isCloseTo(Math.sin(3 * Math.PI * 150 / 650),
                within(1e-12));
        assertThat(r.path("note").path("name").asString()).isEqualTo("C#4");
        assertThat(r.path("modeShapes").asString()).isEqualTo("sine");
        assertThat(r.path("caution").asString()).contains("eye protection");
        // Default chart sampling: mode 3 at max(24, 6·3) = 24 equal intervals, the sine
        // sin(3πx/L) written to 1e-5 (ChartPrecision), positions to 0.001 mm.
        assertThat(m3.path("shape")).hasSize(25);
        assertThat(m3.path("shapeX")).hasSize(25);
        for (int i = 0; i <= 24; i++) {
            double x = 650.0 * i / 24;
            assertThat(m3.path("shapeX").get(i).asDouble()).isCloseTo(x, within(5e-4));
            assertThat(m3.path("shape").get(i).asDouble()).isCloseTo(Math.sin(3 * Math.PI * x / 650), within(5e-6));
        }
    }

    @Test
    void shapeSamplingFollowsTheModeNumberAndCanBeLeftOut() throws Exception {
        String body = """
                {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.30,
                 "modeCount": 40, "pickups": [{"positionMm": 150.0}]%s}""";
        JsonNode chart = postJson("/api/v1/strings/analyze", body.formatted(""));
        // Six intervals per half-wave, at least 24, at most 200.
        assertThat(chart.path("modes").get(0).path("shape")).hasSize(25);
        assertThat(chart.path("modes").get(9).path("shape")).hasSize(61);
        assertThat(chart.path("modes").get(39).path("shape")).hasSize(201);
        // Mode 10's nodes x = kL/10 fall on samples, where sin(10πx/L) is 0 to the written precision.
        for (int k = 0; k <= 10; k++) {
            assertThat(chart.path("modes").get(9).path("shape").get(6 * k).asDouble()).isZero();
        }
        JsonNode none = postJson("/api/v1/strings/analyze?shapes=none", body.formatted(""));
        assertThat(none.path("modes").get(9).path("shape").isNull()).isTrue();
        assertThat(none.path("modes").get(9).path("shapeX").isNull()).isTrue();
        // Everything else is the same answer.
        for (int i = 0; i < 40; i++) {
            JsonNode a = chart.path("modes").get(i);
            JsonNode b = none.path("modes").get(i);
            assertThat(b.path("frequencyHz").asDouble()).isEqualTo(a.path("frequencyHz").asDouble());
            assertThat(b.path("nodesMm")).isEqualTo(a.path("nodesMm"));
            assertThat(b.path("pickupResponse")).isEqualTo(a.path("pickupResponse"));
        }
    }

    @Test
    void clampedTargetSoundsTheTargetAndCombinesTwoPickups() throws Exception {
        JsonNode r = postJson("/api/v1/strings/analyze", """
                {"lengthMm": 650.0, "targetHz": 329.63, "material": "plain-steel", "diameterMm": 0.30,
                 "endCondition": "clamped", "stiffness": true, "modeCount": 24, "shapeSamples": 11,
                 "pickups": [{"positionMm": 150.0, "apertureMm": 10.0}, {"positionMm": 600.0}],
                 "pickupCombination": "opposite", "pluck": {"positionMm": 120.0, "kind": "strike"},
                 "referenceA4Hz": 442}""");
        assertThat(r.path("fundamentalHz").asDouble()).isCloseTo(329.63, within(1e-7));
        assertThat(r.path("modes").get(0).path("frequencyHz").asDouble()).isCloseTo(329.63, within(1e-7));
        assertThat(r.path("modeShapes").asString()).isEqualTo("clamped-beam-under-tension");
        assertThat(r.path("referenceA4Hz").asDouble()).isEqualTo(442.0);
        for (JsonNode m : r.path("modes")) {
            int n = m.path("n").asInt();
            assertThat(m.path("nodesMm")).hasSize(n + 1);
            assertThat(m.path("antinodesMm")).hasSize(n);
            double g1 = m.path("pickupResponse").get(0).asDouble();
            double g2 = m.path("pickupResponse").get(1).asDouble();
            assertThat(m.path("combinedResponse").asDouble()).isCloseTo(g1 - g2, within(1e-15));
            assertThat(m.path("excitation").asDouble()).isCloseTo(Math.sin(n * Math.PI * 120 / 650) / n, within(1e-12));
            assertThat(m.path("shape").get(0).asDouble()).isCloseTo(0.0, within(1e-12));
            // Partials of a clamped stiff string sit sharp of the harmonic series.
            assertThat(m.path("centsFromHarmonic").asDouble()).isPositive();
        }
    }

    @Test
    void linearDensityAloneNeedsNoMaterial() throws Exception {
        JsonNode r = postJson("/api/v1/strings/analyze", """
                {"lengthMm": 1000.0, "tensionN": 100.0, "linearDensityKgPerM": 0.01, "modeCount": 3}""");
        // Mersenne: √(100/0.01)/(2·1 m) = 50 Hz exactly.
        assertThat(r.path("fundamentalHz").asDouble()).isCloseTo(50.0, within(1e-12));
        assertThat(r.path("stressPa").isNull()).isTrue();
        assertThat(r.path("modes").get(2).path("frequencyHz").asDouble()).isCloseTo(150.0, within(1e-12));
        assertThat(r.path("modes").get(2).path("excitation").isNull()).isTrue();
    }

    @Test
    void nearBreakingStressIsWarnedStrongly() throws Exception {
        // 0.25 mm plain steel tuned to A4 on 650 mm: T = μ(2Lf)² ≈ 126 N, σ ≈ 2.57 GPa, 99 % of 2.6 GPa.
        JsonNode r = postJson("/api/v1/strings/analyze", """
                {"lengthMm": 650.0, "targetHz": 440.0, "material": "plain-steel", "diameterMm": 0.25}""");
        assertThat(r.path("stressFraction").asDouble()).isGreaterThan(0.9);
        assertThat(r.path("warnings").get(0).asString()).startsWith("DANGER");
        // The pages mark the string by this word instead of keeping copies of the 75 % / 90 % limits.
        assertThat(r.path("stressLevel").asString()).isEqualTo("danger");
    }

    @Test
    void stressLevelFollowsTheCoreLimits() throws Exception {
        // 0.25 mm plain steel at E4 on 650 mm: T = mu(2Lf)^2 = 71 N, about 56 % of the catalogue strength.
        JsonNode ok = postJson("/api/v1/strings/analyze", """
                {"lengthMm": 650.0, "targetHz": 329.63, "material": "plain-steel", "diameterMm": 0.25}""");
        assertThat(ok.path("stressLevel").asString()).isEqualTo("ok");
        JsonNode unknown = postJson("/api/v1/strings/analyze", """
                {"lengthMm": 1000.0, "tensionN": 100.0, "linearDensityKgPerM": 0.01, "modeCount": 3}""");
        assertThat(unknown.path("stressLevel").isNull()).isTrue();
    }

    @Test
    void stringSetTotalsTheNeckLoad() throws Exception {
        JsonNode r = postJson("/api/v1/string-sets/analyze", """
                {"lengthMm": 650.0, "referenceA4Hz": 440.0, "strings": [ {"targetHz": 329.63, "material": "plain-steel",
                 "diameterMm": 0.25, "wrapMaterial": null, "wrapDiameterMm": null, "lengthMm": null},
                 {"targetHz": 82.41, "material": "plain-steel", "diameterMm": 0.4, "wrapMaterial": "nickel-plated-steel",
                  "wrapDiameterMm": 0.38, "lengthMm": 660.0, "label": "low E"}]}""");
        // Worked by hand: μ(2Lf)² = 3.853360e-4·(2·0.65·329.63)² = 70.7587 N.
        assertThat(r.path("strings").get(0).path("tensionN").asDouble()).isCloseTo(70.7587, within(1e-4));
        double t2 = r.path("strings").get(1).path("tensionN").asDouble();
        assertThat(t2).isCloseTo(6.810882e-3 * Math.pow(2 * 0.66 * 82.41, 2), within(1e-4));
        assertThat(r.path("totalTensionN").asDouble()).isCloseTo(70.7587 + t2, within(1e-4));
        assertThat(r.path("strings").get(1).path("lengthMm").asDouble()).isEqualTo(660.0);
        assertThat(r.path("strings").get(1).path("note").path("name").asString()).isEqualTo("E2");
        // The limits the pages mark on their drawings come with the answer (common practice: a
        // caution above 75 % of the typical breaking stress, danger above 90 %).
        assertThat(r.path("stressLimits").path("warningFraction").asDouble()).isEqualTo(0.75);
        assertThat(r.path("stressLimits").path("dangerFraction").asDouble()).isEqualTo(0.90);
    }

    @Test
    void gaugeForAWantedTension() throws Exception {
        // Closed form for a flexible plain string, d = √(T/(πρ))/(L·f): 70 N at 329.63 Hz on 650 mm of
        // plain steel (ρ = 7850) gives 0.248656 mm (worked by hand).
        JsonNode plain = postJson("/api/v1/strings/gauge", """
                {"lengthMm": 650.0, "targetHz": 329.63, "tensionN": 70.0, "material": "plain-steel"}""");
        assertThat(plain.path("solved").asString()).isEqualTo("diameterMm");
        assertThat(plain.path("diameterMm").asDouble()).isCloseTo(0.248656, within(1e-6));
        JsonNode wound = postJson("/api/v1/strings/gauge", """
                {"lengthMm": 650.0, "targetHz": 82.41, "tensionN": 80.0, "material": "plain-steel",
                 "wrapMaterial": "phosphor-bronze", "coreDiameterMm": 0.40, "stiffness": true}""");
        assertThat(wound.path("solved").asString()).isEqualTo("wrapDiameterMm");
        // The string it makes must need 80 N at 82.41 Hz: check through the analysis endpoint.
        JsonNode check = postJson("/api/v1/strings/analyze", """
                {"lengthMm": 650.0, "targetHz": 82.41, "material": "plain-steel", "diameterMm": 0.40,
                 "wrapMaterial": "phosphor-bronze", "wrapDiameterMm": %s, "stiffness": true, "modeCount": 1}"""
                .formatted(wound.path("wrapDiameterMm").asDouble()));
        assertThat(check.path("tensionN").asDouble()).isCloseTo(80.0, within(1e-6));
    }

    @Test
    void fretsAndMaterials() throws Exception {
        JsonNode frets = getJson("/api/v1/frets?scaleLengthMm=650&count=22&divisionsPerOctave=12");
        assertThat(frets).hasSize(22);
        // x_k = L(1 − 2^(−k/12)): fret 12 at L/2 exactly; fret 1 at 36.4817 mm (worked by hand).
        assertThat(frets.get(11).path("fromNutMm").asDouble()).isCloseTo(325.0, within(1e-9));
        assertThat(frets.get(0).path("fromNutMm").asDouble()).isCloseTo(36.481697, within(1e-6));
        assertThat(frets.get(0).path("fromPreviousMm").asDouble()).isCloseTo(36.481697, within(1e-6));
        JsonNode materials = getJson("/api/v1/materials");
        assertThat(materials.size()).isGreaterThanOrEqualTo(8);
        for (JsonNode m : materials) {
            assertThat(m.path("source").asString()).isNotBlank();
            assertThat(m.path("densityKgPerM3").asDouble()).isPositive();
        }
    }
}
