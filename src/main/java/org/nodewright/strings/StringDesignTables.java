package org.nodewright.strings;

import org.nodewright.web.DesignTable;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/** The CSV tables of saved string and string-set designs: the same rows as their CSV endpoints. */
@Configuration(proxyBeanMethods = false)
class StringDesignTables {

    @Bean
    DesignTable stringPartialsTable(StringsApiController api) {
        return DesignTable.of(StringAnalysisRequest.class,
                (r, name) -> StringsApiController.MODE_COLUMNS.download(api.modes(r), name));
    }

    @Bean
    DesignTable stringSetTable(StringsApiController api) {
        return DesignTable.of(StringSetRequest.class,
                (r, name) -> StringsApiController.SET_COLUMNS.download(api.set(r).strings(), name));
    }
}
