package org.nodewright.inverse;

import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/** The gauge picker and compensation endpoints over HTTP. */
@StoreFreeWebTest
class StringDesignApiTest {


    @Autowired
    MockMvc mvc;

    @Test
    void aSixStringSetGetsAGaugePerStringAndItsTotal() throws Exception {
        // 16.2 lbf = 72.1 N for .010 plain steel at E4 on a 25.5 in (647.7 mm) scale: a string maker's
        // published chart (from memory); the picker must pick 0.254 mm.
        String body = "{\"lengthMm\":647.7,\"strings\":[{\"note\":\"E4\",\"targetTensionN\":72.1,\"material\":\"plain-steel\"},"
                + "{\"targetHz\":110.0,\"targetTensionN\":80,\"material\":\"nickel-plated-steel\","
                + "\"wrapMaterial\":\"nickel-plated-steel\"}]}";
        mvc.perform(post("/api/v1/inverse/gauges").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.strings[0].diameterMm").value(Matchers.closeTo(0.254, 1e-9), Double.class))
                .andExpect(jsonPath("$.strings[1].wound").value(true))
                .andExpect(jsonPath("$.strings[1].offPct").value(Matchers.closeTo(0.0, 5.0), Double.class))
                .andExpect(jsonPath("$.totalTensionN").value(Matchers.greaterThan(140.0), Double.class));
    }

    @Test
    void aTensionProfileFillsStringsWithoutTheirOwnTarget() throws Exception {
        String body = "{\"lengthMm\":650,\"tensionProfile\":{\"firstN\":60,\"lastN\":80},\"strings\":["
                + "{\"note\":\"E4\",\"material\":\"nylon\"},{\"note\":\"B3\",\"material\":\"nylon\"}]}";
        mvc.perform(post("/api/v1/inverse/gauges").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.strings[0].targetTensionN").value(60.0))
                .andExpect(jsonPath("$.strings[1].targetTensionN").value(80.0));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "{\"lengthMm\":650,\"strings\":[{\"note\":\"E4\",\"targetTensionN\":70,\"material\":\"unobtainium\"}]} | strings[0].material",
        "{\"lengthMm\":650,\"strings\":[{\"note\":\"X9\",\"targetTensionN\":70,\"material\":\"nylon\"}]} | strings[0].note",
        "{\"lengthMm\":650,\"strings\":[{\"note\":\"E4\",\"material\":\"nylon\"}]} | strings[0].targetTensionN",
        "{\"lengthMm\":-1,\"strings\":[{\"note\":\"E4\",\"targetTensionN\":70,\"material\":\"nylon\"}]} | lengthMm",
        "{\"lengthMm\":650,\"availableGaugesMm\":[0],\"strings\":[{\"note\":\"E4\",\"targetTensionN\":70,\"material\":\"nylon\"}]} | availableGaugesMm[0]"
    })
    void badGaugeRequestsNameTheField(String body, String field) throws Exception {
        mvc.perform(post("/api/v1/inverse/gauges").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[0].field").value(field));
    }

    @Test
    void compensationStatesItsModelAndSetsTheSaddleBack() throws Exception {
        String body = "{\"lengthMm\":650,\"actionAt12thMm\":3.0,\"nutHeightMm\":0.5,\"strings\":["
                + "{\"note\":\"E4\",\"material\":\"nylon\",\"diameterMm\":0.71},"
                + "{\"note\":\"E2\",\"material\":\"nylon\",\"diameterMm\":0.35,\"wrapMaterial\":\"copper\",\"wrapDiameterMm\":0.2}]}";
        mvc.perform(post("/api/v1/templates/compensation").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.model").value(Matchers.containsString("Varieschi")))
                .andExpect(jsonPath("$.assumptions").isNotEmpty())
                .andExpect(jsonPath("$.strings[0].saddleSetbackMm").value(Matchers.greaterThan(0.5), Double.class))
                .andExpect(jsonPath("$.strings[0].worstCompensatedCents").value(Matchers.lessThan(3.0), Double.class))
                .andExpect(jsonPath("$.strings[1].saddleSetbackMm").value(Matchers.greaterThan(0.0), Double.class));
        mvc.perform(post("/api/v1/templates/compensation").contentType(MediaType.APPLICATION_JSON)
                        .content(body.replace("\"wrapDiameterMm\":0.2", "\"wrapDiameterMm\":\"x\"")))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("strings[1].wrapDiameterMm"));
    }
}
