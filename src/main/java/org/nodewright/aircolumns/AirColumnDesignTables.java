package org.nodewright.aircolumns;

import org.nodewright.web.DesignTable;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/** The CSV table of a saved air-column design: the same rows as {@code resonances.csv}. */
@Configuration(proxyBeanMethods = false)
class AirColumnDesignTables {

    @Bean
    DesignTable airColumnResonancesTable(AirColumnController api) {
        return DesignTable.of(AirColumnRequest.class,
                (r, name) -> AirColumnController.RESONANCE_COLUMNS.download(api.analyze(r).resonances(), name));
    }
}
