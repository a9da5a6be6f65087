package org.nodewright.designs;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.nodewright.TemporaryDataDirectory;
import org.nodewright.TestProperties;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.ContextConfiguration;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * First start on a fresh store: demo designs of every kind there is, each with a history of two
 * or three revisions and tags, all tagged demo; removed in one call, and not added again.
 */
@SpringBootTest(properties = {TestProperties.NO_WARM_UP, TestProperties.NO_BANNER, "app.demo=true"})
@AutoConfigureMockMvc
@ContextConfiguration(initializers = TemporaryDataDirectory.class)
class DemoLibraryTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    JsonMapper mapper;
    @Autowired
    DemoLibrary demo;

    private JsonNode json(String url) throws Exception {
        return mapper.readTree(mvc.perform(get(url)).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString());
    }

    @Test
    void aFreshStoreHoldsDemoDesignsOfEveryKindWithHistoriesAndTagsThenTheyGoInOneCall() throws Exception {
        JsonNode list = json("/api/v1/designs?tag=demo");
        Set<String> kinds = new HashSet<>();
        for (JsonNode d : list) {
            kinds.add(d.get("kind").asString());
            List<String> tags = d.get("tags").valueStream().map(JsonNode::asString).toList();
            assertThat(tags).contains("demo").hasSizeGreaterThan(1);
            assertThat(d.get("name").asString()).contains("Harrowgate");
            JsonNode revisions = json("/api/v1/designs/" + d.get("id").asLong() + "/revisions");
            assertThat(revisions.size()).as(d.get("name").asString()).isBetween(2, 3);
            assertThat(d.get("version").asLong()).isEqualTo(revisions.size());
        }
        for (DesignKind kind : DesignKind.values()) {
            assertThat(kinds).as("a demo design of kind " + kind.word() + " (src/main/resources/demo/"
                    + kind.word() + ".json)").contains(kind.word());
        }
        assertThat(json("/api/v1/designs").size()).isEqualTo(list.size());

        mvc.perform(delete("/api/v1/designs/demo")).andExpect(status().isOk())
                .andExpect(jsonPath("$.deleted").value(list.size()));
        assertThat(json("/api/v1/designs").size()).isZero();
        // Once removed, a later start does not bring them back (the store remembers the first start).
        demo.afterPropertiesSet();
        assertThat(json("/api/v1/designs").size()).isZero();
    }

    @Test
    void everyDemoRevisionPassesTheRulesOfItsKind() {
        // histories() checks each revision as a save would, and throws naming the file and revision.
        assertThat(demo.histories(true)).hasSizeGreaterThanOrEqualTo(DesignKind.values().length);
    }
}
