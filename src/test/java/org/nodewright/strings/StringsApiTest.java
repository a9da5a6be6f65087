package org.nodewright.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;
import org.springframework.test.web.servlet.MockMvc;

/** The strings API answers well-formed requests with the contract's fields. */
@SpringBootTest
@AutoConfigureMockMvc
class StringsApiTest {

    @DynamicPropertySource
    static void dataDir(DynamicPropertyRegistry registry) throws Exception {
        Path dir = Files.createTempDirectory("nodewright-strings-");
        registry.add("app.data-dir", dir::toString);
    }

    @Autowired
    MockMvc mvc;

    private String postJson(String path, String body) throws Exception {
        return mvc.perform(post(path).contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
    }

    @Test
    void analyzesTheContractExample() throws Exception {
        String body = """
                {"lengthMm": 650.0, "tensionN": 70.0, "targetHz": null, "linearDensityKgPerM": null,
                 "material": "plain-steel", "diameterMm": 0.30, "wrapMaterial": null, "wrapDiameterMm": null,
                 "youngsModulusPa": null, "endCondition": "pinned", "stiffness": true, "modeCount": 12,
                 "pluck": {"positionMm": 120.0, "kind": "pluck"},
                 "pickups": [{"positionMm": 150.0, "apertureMm": 0.0}]}""";
        String json = postJson("/api/v1/strings/analyze", body);
        System.out.println(json.substring(0, Math.min(3000, json.length())));
        assertThat(json).contains("\"modes\"");
    }

    @Test
    void clampedTargetPitch() throws Exception {
        String body = """
                {"lengthMm": 650.0, "targetHz": 329.63, "material": "plain-steel", "diameterMm": 0.30,
                 "endCondition": "clamped", "stiffness": true, "modeCount": 24, "shapeSamples": 11,
                 "pickups": [{"positionMm": 150.0, "apertureMm": 10.0}, {"positionMm": 600.0}],
                 "pickupCombination": "opposite", "pluck": {"positionMm": 120.0, "kind": "strike"}}""";
        String json = postJson("/api/v1/strings/analyze", body);
        System.out.println(json.substring(0, Math.min(3000, json.length())));
    }

    @Test
    void setsFretsMaterials() throws Exception {
        System.out.println(postJson("/api/v1/string-sets/analyze", """
                {"lengthMm": 650.0, "referenceA4Hz": 440.0, "strings": [ {"targetHz": 329.63, "material": "plain-steel",
                 "diameterMm": 0.25, "wrapMaterial": null, "wrapDiameterMm": null, "lengthMm": null},
                 {"targetHz": 82.41, "material": "plain-steel", "diameterMm": 0.4, "wrapMaterial": "nickel-plated-steel",
                  "wrapDiameterMm": 0.38, "lengthMm": 660.0}]}"""));
        System.out.println(mvc.perform(get("/api/v1/frets?scaleLengthMm=650&count=3&divisionsPerOctave=12"))
                .andReturn().getResponse().getContentAsString());
        mvc.perform(get("/api/v1/materials")).andExpect(status().isOk()).andExpect(jsonPath("$[0].id").value("plain-steel"));
    }
}
