package org.nodewright.designs;

import java.util.List;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.DesignTable;
import org.nodewright.web.FieldProblem;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.json.JsonMapper;

/**
 * The table of a saved design as CSV: partials of a string, resonances of an air column, strings of
 * a set. The parameters are validated as the analysis endpoint validates them (problems named by
 * their path in the parameters); the feature that owns the kind's request writes the rows.
 */
@RestController
class DesignCsvController {

    private final DesignLibrary library;
    private final DesignParameters parameters;
    private final JsonMapper mapper;
    private final List<DesignTable> tables;

    DesignCsvController(DesignLibrary library, DesignParameters parameters, JsonMapper mapper,
            List<DesignTable> tables) {
        this.library = library;
        this.parameters = parameters;
        this.mapper = mapper;
        this.tables = tables;
    }

    @GetMapping("/api/v1/designs/{id}/csv")
    ResponseEntity<String> csv(@PathVariable long id) {
        Design d = library.get(id);
        List<FieldProblem> problems = parameters.check(d.kind(), d.parameters(), "").stream()
                .map(p -> new FieldProblem(p.field().startsWith(".") ? p.field().substring(1) : p.field(),
                        p.message()))
                .toList();
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
        DesignTable table = tables.stream().filter(t -> t.requestType() == d.kind().requestClass()).findFirst()
                .orElseThrow(() -> new BadRequestException("kind", "a " + d.kind().word()
                        + " design has no table to export"));
        return table.csv(mapper.treeToValue(d.parameters(), d.kind().requestClass()), "design-" + id + ".csv");
    }
}
