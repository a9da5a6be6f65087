package org.nodewright.designs;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.web.ErrorResponseException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The saved-design contract, run against each store (H2 always, PostgreSQL when configured):
 * create, read, search, save over a version, stale writes refused, revisions, restore, compare,
 * delete, and concurrent writers all accounted for.
 */
abstract class DesignApiContract {

    /** A string as the contract's example request gives it (650 mm plain steel 0.30 mm at 70 N). */
    static final String STRING_PARAMS = """
            {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.30,
             "endCondition": "pinned", "stiffness": true, "modeCount": 12}""";

    /** An air column as the contract's example gives it: a 300 mm cylinder of 15 mm bore, closed at the input. */
    static final String BORE_PARAMS = """
            {"segments": [{"lengthMm": 300.0, "inputDiameterMm": 15.0, "outputDiameterMm": 15.0}],
             "inputEnd": "closed", "outputEnd": "open-unflanged", "fMinHz": 20.0, "fMaxHz": 3000.0}""";

    @Autowired
    MockMvc mvc;

    @Autowired
    JsonMapper mapper;

    @Autowired
    JdbcClient jdbc;

    @Autowired
    DesignLibrary library;

    @BeforeEach
    void emptyLibrary() {
        jdbc.sql("DELETE FROM design_revisions").update();
        jdbc.sql("DELETE FROM design_tags").update();
        jdbc.sql("DELETE FROM designs").update();
    }

    JsonNode create(String name, String kind, String params, String tags) throws Exception {
        String body = "{\"name\": " + mapper.writeValueAsString(name) + ", \"kind\": \"" + kind + "\", \"parameters\": "
                + params + ", \"tags\": " + tags + ", \"notes\": \"Harrowgate Lane Workshop bench 2\", \"author\": \"Ada\"}";
        String json = mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isCreated())
                .andExpect(header().exists("Location"))
                .andReturn().getResponse().getContentAsString();
        return mapper.readTree(json);
    }

    String putBody(long version, String name, String params) throws Exception {
        return "{\"version\": " + version + ", \"name\": " + mapper.writeValueAsString(name) + ", \"parameters\": "
                + params + ", \"tags\": [\"steel\"], \"author\": \"Bram\"}";
    }

    @Test
    void createdDesignIsReadBackWithIdVersionAuthorAndTimes() throws Exception {
        JsonNode created = create("Harrowgate parlour guitar, top E", "string", STRING_PARAMS, "[\"steel\", \"parlour\"]");
        assertThat(created.get("id").asLong()).isPositive();
        assertThat(created.get("version").asLong()).isEqualTo(1);

        mvc.perform(get("/api/v1/designs/" + created.get("id").asLong()))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.name").value("Harrowgate parlour guitar, top E"))
                .andExpect(jsonPath("$.kind").value("string"))
                .andExpect(jsonPath("$.parameters.lengthMm").value(650.0))
                .andExpect(jsonPath("$.tags.length()").value(2))
                .andExpect(jsonPath("$.author").value("Ada"))
                .andExpect(jsonPath("$.createdAt").isString())
                .andExpect(jsonPath("$.updatedAt").isString())
                .andExpect(jsonPath("$.version").value(1));
    }

    @Test
    void listSearchesByNameTagAndKind() throws Exception {
        create("Parlour top E", "string", STRING_PARAMS, "[\"steel\", \"Parlour\"]");
        create("Parlour bottom E", "string", STRING_PARAMS, "[\"wound\"]");
        create("Alto recorder bore", "air-column", BORE_PARAMS, "[\"parlour\"]");
        create("100%_odd name", "string", STRING_PARAMS, "[]");

        mvc.perform(get("/api/v1/designs")).andExpect(jsonPath("$.length()").value(4));
        mvc.perform(get("/api/v1/designs").param("name", "parlour")).andExpect(jsonPath("$.length()").value(2));
        mvc.perform(get("/api/v1/designs").param("tag", "PARLOUR")).andExpect(jsonPath("$.length()").value(2));
        mvc.perform(get("/api/v1/designs").param("tag", "parlour").param("kind", "string"))
                .andExpect(jsonPath("$.length()").value(1))
                .andExpect(jsonPath("$[0].name").value("Parlour top E"));
        // LIKE wildcards in a search are taken literally.
        mvc.perform(get("/api/v1/designs").param("name", "%_")).andExpect(jsonPath("$.length()").value(1));
        mvc.perform(get("/api/v1/designs").param("kind", "banjo"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("kind"));
    }

    @Test
    void saveOverCurrentVersionBumpsItAndKeepsARevision() throws Exception {
        JsonNode created = create("Top E", "string", STRING_PARAMS, "[]");
        long id = created.get("id").asLong();
        String changed = STRING_PARAMS.replace("70.0", "72.5");
        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(putBody(1, "Top E, heavier", changed)))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.version").value(2))
                .andExpect(jsonPath("$.updatedBy").value("Bram"))
                .andExpect(jsonPath("$.author").value("Ada"))
                .andExpect(jsonPath("$.parameters.tensionN").value(72.5));

        mvc.perform(get("/api/v1/designs/" + id + "/revisions"))
                .andExpect(jsonPath("$.length()").value(2))
                .andExpect(jsonPath("$[0].version").value(1))
                .andExpect(jsonPath("$[0].parameters.tensionN").value(70.0))
                .andExpect(jsonPath("$[1].name").value("Top E, heavier"));
        mvc.perform(get("/api/v1/designs/" + id + "/revisions/1"))
                .andExpect(jsonPath("$.name").value("Top E"))
                .andExpect(jsonPath("$.savedBy").value("Ada"));
    }

    @Test
    void unitsSavedWithADesignAreReadBackByAnyoneAndKeptByASaveThatGivesNone() throws Exception {
        // Issue 16 item 8: a design saved in inch/lbf reopens so for whoever opens it.
        String body = "{\"name\": \"Top E in inches\", \"kind\": \"string\", \"parameters\": " + STRING_PARAMS
                + ", \"units\": {\"length\": \"inch\", \"force\": \"lbf\"}}";
        JsonNode created = mapper.readTree(mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                .content(body)).andExpect(status().isCreated()).andReturn().getResponse().getContentAsString());
        long id = created.get("id").asLong();
        mvc.perform(get("/api/v1/designs/" + id))
                .andExpect(jsonPath("$.units.length").value("inch"))
                .andExpect(jsonPath("$.units.force").value("lbf"));
        // A script's save that knows nothing of units changes none of them.
        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                .content(putBody(1, "Top E in inches", STRING_PARAMS))).andExpect(status().isOk());
        mvc.perform(get("/api/v1/designs/" + id)).andExpect(jsonPath("$.units.length").value("inch"));
        // A save in other units keeps those.
        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                .content("{\"version\": 2, \"name\": \"Top E\", \"parameters\": " + STRING_PARAMS
                        + ", \"units\": {\"length\": \"mm\", \"force\": \"kgf\"}}")).andExpect(status().isOk());
        mvc.perform(get("/api/v1/designs?name=Top E")).andExpect(jsonPath("$[0].units.force").value("kgf"));
        // Units other than the pages' are refused on their field.
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content(body.replace("\"lbf\"", "\"stone\"")))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("units.force"))
                .andExpect(jsonPath("$.errors[0].message").value("must be N, kgf or lbf"));
    }

    @Test
    void staleWriteIsRefusedWith409NamingWhoChangedItAndStoredDesignIsUnchanged() throws Exception {
        long id = create("Top E", "string", STRING_PARAMS, "[]").get("id").asLong();
        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                .content(putBody(1, "Bram's save", STRING_PARAMS))).andExpect(status().isOk());
        String before = mvc.perform(get("/api/v1/designs/" + id)).andReturn().getResponse().getContentAsString();

        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(putBody(1, "Stale save", STRING_PARAMS.replace("70.0", "99.0"))))
                .andExpect(status().isConflict())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.status").value(409))
                .andExpect(jsonPath("$.changedBy").value("Bram"))
                .andExpect(jsonPath("$.currentVersion").value(2))
                .andExpect(jsonPath("$.yourVersion").value(1))
                .andExpect(jsonPath("$.changedAt").isString());

        String after = mvc.perform(get("/api/v1/designs/" + id)).andReturn().getResponse().getContentAsString();
        assertThat(mapper.readTree(after)).isEqualTo(mapper.readTree(before));
        mvc.perform(get("/api/v1/designs/" + id + "/revisions")).andExpect(jsonPath("$.length()").value(2));
    }

    @Test
    void putWithoutVersionIs400AndChangesNothing() throws Exception {
        long id = create("Top E", "string", STRING_PARAMS, "[]").get("id").asLong();
        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \"No version\", \"parameters\": " + STRING_PARAMS + "}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("version"));
        mvc.perform(get("/api/v1/designs/" + id)).andExpect(jsonPath("$.name").value("Top E"))
                .andExpect(jsonPath("$.version").value(1));
    }

    @Test
    void badCreateRequestsNameTheField() throws Exception {
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \"x\", \"kind\": \"banjo\", \"parameters\": {}}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("kind"));
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \" \", \"kind\": \"string\", \"parameters\": " + STRING_PARAMS + "}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("name"));
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \"x\", \"kind\": \"string\", \"parameters\": [1, 2]}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("parameters"));
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \"x\", \"kind\": \"string\"}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("parameters"));
        mvc.perform(get("/api/v1/designs")).andExpect(jsonPath("$.length()").value(0));
    }

    @Test
    void parametersAreValidatedByTheRulesOfTheAnalysisRequest() throws Exception {
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \"x\", \"kind\": \"string\", \"parameters\": "
                                + STRING_PARAMS.replace("650.0", "-650.0") + "}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("parameters.lengthMm"));
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \"x\", \"kind\": \"string\", \"parameters\": "
                                + STRING_PARAMS.replace("650.0", "\"650\"") + "}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("parameters.lengthMm"));
        mvc.perform(get("/api/v1/designs")).andExpect(jsonPath("$.length()").value(0));
    }

    @Test
    void restoreMakesANewRevisionFromAnOldOne() throws Exception {
        long id = create("Top E", "string", STRING_PARAMS, "[]").get("id").asLong();
        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                .content(putBody(1, "Top E heavy", STRING_PARAMS.replace("70.0", "80.0")))).andExpect(status().isOk());
        mvc.perform(post("/api/v1/designs/" + id + "/revisions/1/restore").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"version\": 2, \"author\": \"Cleo\"}"))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.version").value(3))
                .andExpect(jsonPath("$.name").value("Top E"))
                .andExpect(jsonPath("$.parameters.tensionN").value(70.0))
                .andExpect(jsonPath("$.updatedBy").value("Cleo"));
        mvc.perform(get("/api/v1/designs/" + id + "/revisions/3"))
                .andExpect(jsonPath("$.comment").value("restored from version 1"));
        // Restoring over a version that is no longer current is refused like any stale save.
        mvc.perform(post("/api/v1/designs/" + id + "/revisions/2/restore").contentType(MediaType.APPLICATION_JSON)
                .content("{\"version\": 2}")).andExpect(status().isConflict());
        mvc.perform(post("/api/v1/designs/" + id + "/revisions/9/restore")).andExpect(status().isNotFound());
    }

    @Test
    void compareListsTheParametersThatDiffer() throws Exception {
        long a = create("Top E", "string", STRING_PARAMS, "[]").get("id").asLong();
        long b = create("Top E long scale", "string", STRING_PARAMS.replace("650.0", "648").replace("70.0", "75.0"),
                "[]").get("id").asLong();
        long bore = create("Bore", "air-column", BORE_PARAMS, "[]").get("id").asLong();
        mvc.perform(get("/api/v1/designs/compare").param("a", "" + a).param("b", "" + b))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.differences.length()").value(2))
                .andExpect(jsonPath("$.differences[0].path").value("lengthMm"))
                .andExpect(jsonPath("$.differences[0].left").value(650.0))
                .andExpect(jsonPath("$.differences[0].right").value(648))
                .andExpect(jsonPath("$.differences[1].path").value("tensionN"));
        mvc.perform(get("/api/v1/designs/compare").param("a", "" + a).param("b", "" + bore))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("b"));

        mvc.perform(put("/api/v1/designs/" + a).contentType(MediaType.APPLICATION_JSON)
                .content(putBody(1, "Top E", STRING_PARAMS.replace("12}", "16}")))).andExpect(status().isOk());
        mvc.perform(get("/api/v1/designs/" + a + "/revisions/compare").param("from", "1").param("to", "2"))
                .andExpect(jsonPath("$.differences.length()").value(1))
                .andExpect(jsonPath("$.differences[0].path").value("modeCount"));
    }

    @Test
    void deleteRemovesTheDesignAndItsRevisions() throws Exception {
        long id = create("Top E", "string", STRING_PARAMS, "[\"steel\"]").get("id").asLong();
        mvc.perform(delete("/api/v1/designs/" + id)).andExpect(status().isNoContent());
        mvc.perform(get("/api/v1/designs/" + id)).andExpect(status().isNotFound())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"));
        mvc.perform(get("/api/v1/designs/" + id + "/revisions")).andExpect(status().isNotFound());
        mvc.perform(delete("/api/v1/designs/" + id)).andExpect(status().isNotFound());
        assertThat(jdbc.sql("SELECT COUNT(*) FROM design_revisions").query(Long.class).single()).isZero();
    }

    @Test
    void airColumnParametersAreValidatedWithTheirDottedPath() throws Exception {
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\": \"x\", \"kind\": \"air-column\", \"parameters\": "
                                + BORE_PARAMS.replace("300.0", "-3") + "}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("parameters.segments[0].lengthMm"));
    }

    @Test
    void exportedLibraryImportsAsNewDesignsWithTheirHistoryAndOverwritesNothing() throws Exception {
        long id = create("Top E", "string", STRING_PARAMS, "[\"steel\"]").get("id").asLong();
        mvc.perform(put("/api/v1/designs/" + id).contentType(MediaType.APPLICATION_JSON)
                .content(putBody(1, "Top E heavier", STRING_PARAMS.replace("70.0", "74.0")))).andExpect(status().isOk());
        create("Bore", "air-column", BORE_PARAMS, "[]");

        String doc = mvc.perform(get("/api/v1/designs/export"))
                .andExpect(status().isOk())
                .andExpect(header().string("Content-Disposition", org.hamcrest.Matchers.startsWith("attachment")))
                .andExpect(jsonPath("$.format").value("nodewright-library"))
                .andExpect(jsonPath("$.formatVersion").value(1))
                .andExpect(jsonPath("$.designs.length()").value(2))
                .andReturn().getResponse().getContentAsString();

        mvc.perform(post("/api/v1/designs/import").contentType(MediaType.APPLICATION_JSON).content(doc))
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.imported.length()").value(2));
        mvc.perform(get("/api/v1/designs")).andExpect(jsonPath("$.length()").value(4));
        // The original is untouched; its imported twin carries the same two revisions.
        mvc.perform(get("/api/v1/designs/" + id)).andExpect(jsonPath("$.version").value(2));
        String twins = mvc.perform(get("/api/v1/designs").param("name", "Top E heavier"))
                .andReturn().getResponse().getContentAsString();
        JsonNode list = mapper.readTree(twins);
        assertThat(list.size()).isEqualTo(2);
        long twin = list.get(0).get("id").asLong() == id ? list.get(1).get("id").asLong() : list.get(0).get("id").asLong();
        mvc.perform(get("/api/v1/designs/" + twin + "/revisions"))
                .andExpect(jsonPath("$.length()").value(2))
                .andExpect(jsonPath("$[0].parameters.tensionN").value(70.0))
                .andExpect(jsonPath("$[1].parameters.tensionN").value(74.0));
    }

    @Test
    void importIsValidatedAndAllOrNothing() throws Exception {
        String good = "{\"name\": \"Good\", \"kind\": \"string\", \"parameters\": " + STRING_PARAMS + "}";
        String bad = "{\"name\": \"Bad\", \"kind\": \"string\", \"parameters\": "
                + STRING_PARAMS.replace("650.0", "-1") + "}";
        mvc.perform(post("/api/v1/designs/import").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"format\": \"nodewright-library\", \"formatVersion\": 1, \"designs\": ["
                                + good + ", " + bad + "]}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("designs[1].parameters.lengthMm"));
        mvc.perform(post("/api/v1/designs/import").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"format\": \"something-else\", \"formatVersion\": 2, \"designs\": []}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors.length()").value(2));
        mvc.perform(post("/api/v1/designs/import").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"format\": \"nodewright-library\", \"formatVersion\": 1, \"designs\": [], \"x\": 1}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("x"));
        mvc.perform(get("/api/v1/designs")).andExpect(jsonPath("$.length()").value(0));
    }

    @Test
    void importIntoAnExistingDesignOnlyWhenAskedAndOverItsCurrentVersion() throws Exception {
        long id = create("Top E", "string", STRING_PARAMS, "[]").get("id").asLong();
        String doc = "{\"format\": \"nodewright-library\", \"formatVersion\": 1, \"designs\": [{\"name\": \"From file\","
                + " \"kind\": \"string\", \"parameters\": " + STRING_PARAMS.replace("70.0", "66.0") + "}]}";
        mvc.perform(post("/api/v1/designs/" + id + "/import").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"version\": 1, \"document\": " + doc + "}"))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.version").value(2))
                .andExpect(jsonPath("$.parameters.tensionN").value(66.0));
        mvc.perform(post("/api/v1/designs/" + id + "/import").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"version\": 1, \"document\": " + doc + "}"))
                .andExpect(status().isConflict());
        mvc.perform(get("/api/v1/designs/" + id + "/revisions/2"))
                .andExpect(jsonPath("$.comment").value("imported from a file"));
    }

    /**
     * Import rules the library promises (README, shop library): a file is imported into an existing
     * design only as a design of the same kind, only one design at a time, and a history whose older
     * revision does not validate is refused whole, naming that revision; nothing is written then.
     */
    @Test
    void importRefusesAnotherKindTwoDesignsAndABadRevisionAndWritesNothing() throws Exception {
        long id = create("Top E", "string", STRING_PARAMS, "[]").get("id").asLong();
        String bore = "{\"name\": \"Bore\", \"kind\": \"air-column\", \"parameters\": " + BORE_PARAMS + "}";
        String string = "{\"name\": \"Other E\", \"kind\": \"string\", \"parameters\": " + STRING_PARAMS + "}";
        String head = "{\"format\": \"nodewright-library\", \"formatVersion\": 1, \"designs\": [";
        mvc.perform(post("/api/v1/designs/" + id + "/import").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"version\": 1, \"document\": " + head + bore + "]}}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("document.designs[0].kind"));
        mvc.perform(post("/api/v1/designs/" + id + "/import").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"version\": 1, \"document\": " + head + string + ", " + string + "]}}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("document.designs"));
        // A two-revision history whose first revision has a negative scale length.
        String history = "{\"name\": \"Top E again\", \"kind\": \"string\", \"parameters\": " + STRING_PARAMS
                + ", \"version\": 2, \"revisions\": [{\"version\": 1, \"name\": \"first\", \"parameters\": "
                + STRING_PARAMS.replace("650.0", "-650.0") + "}, {\"version\": 2, \"name\": \"second\", \"parameters\": "
                + STRING_PARAMS + "}]}";
        mvc.perform(post("/api/v1/designs/import").contentType(MediaType.APPLICATION_JSON).content(head + history + "]}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("designs[0].revisions[0].parameters.lengthMm"));
        mvc.perform(get("/api/v1/designs")).andExpect(jsonPath("$.length()").value(1));
        mvc.perform(get("/api/v1/designs/" + id)).andExpect(jsonPath("$.version").value(1))
                .andExpect(jsonPath("$.kind").value("string"));
        mvc.perform(get("/api/v1/designs/" + id + "/revisions")).andExpect(jsonPath("$.length()").value(1));
    }

    /**
     * Eight writers race to save over the same design, each retrying on a stale version until its
     * save lands. Every save must be kept as exactly one revision, and the versions must run 1..n
     * with no gap and no save lost.
     */
    @Test
    void concurrentWritersAreAllAccountedFor() throws Exception {
        long id = create("Shared top E", "string", STRING_PARAMS, "[]").get("id").asLong();
        int writers = 8;
        int savesEach = 5;
        ExecutorService pool = Executors.newFixedThreadPool(writers);
        CountDownLatch start = new CountDownLatch(1);
        List<Integer> conflicts = Collections.synchronizedList(new ArrayList<>());
        List<Future<?>> done = new ArrayList<>();
        for (int w = 0; w < writers; w++) {
            String who = "writer-" + w;
            done.add(pool.submit(() -> {
                start.await();
                int refused = 0;
                for (int s = 0; s < savesEach; s++) {
                    while (true) {
                        Design current = library.get(id);
                        DesignContent content = new DesignContent(who + " save " + s, DesignKind.STRING,
                                current.parameters(), "", List.of());
                        try {
                            library.update(id, current.version(), content, who, "saved");
                            break;
                        } catch (ErrorResponseException e) {
                            assertThat(e.getStatusCode().value()).isEqualTo(409);
                            refused++;
                        }
                    }
                }
                conflicts.add(refused);
                return null;
            }));
        }
        start.countDown();
        for (Future<?> f : done) {
            f.get(120, TimeUnit.SECONDS);
        }
        pool.shutdown();

        long expected = 1 + (long) writers * savesEach;
        assertThat(library.get(id).version()).isEqualTo(expected);
        List<DesignRevision> revisions = listRevisions(id);
        assertThat(revisions).hasSize((int) expected);
        assertThat(revisions).extracting(DesignRevision::version)
                .containsExactlyElementsOf(java.util.stream.LongStream.rangeClosed(1, expected).boxed().toList());
        for (int w = 0; w < writers; w++) {
            for (int s = 0; s < savesEach; s++) {
                String name = "writer-" + w + " save " + s;
                assertThat(revisions).extracting(DesignRevision::name).containsOnlyOnce(name);
            }
        }
    }

    private List<DesignRevision> listRevisions(long id) throws Exception {
        String json = mvc.perform(get("/api/v1/designs/" + id + "/revisions")).andReturn().getResponse()
                .getContentAsString();
        return List.of(mapper.readValue(json, DesignRevision[].class));
    }
}
