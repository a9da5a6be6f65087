package org.nodewright.web;

import io.swagger.v3.oas.annotations.OpenAPIDefinition;
import io.swagger.v3.oas.annotations.info.Info;
import io.swagger.v3.oas.annotations.info.License;
import org.springframework.context.annotation.Configuration;

/** Title and summary of the OpenAPI description served at {@code /v3/api-docs}. */
@Configuration(proxyBeanMethods = false)
@OpenAPIDefinition(info = @Info(title = "Nodewright API", version = "v1",
        description = "Modes of strings and air columns for instrument makers: string and string-set analysis, "
                + "frets, materials, air-column impedance and resonances, saved designs, templates, inverse design "
                + "and measured partials. Lengths in millimetres, frequencies in hertz, tension in newtons; bad "
                + "input is answered with an RFC 9457 problem document naming each field. Answers over 2 KiB are "
                + "gzip-compressed for clients that send Accept-Encoding: gzip; sampled curves (mode shapes, "
                + "standing waves) are written to six significant digits, frequencies and the contract's "
                + "positions at full precision; POST /api/v1/strings/analyze?shapes=none leaves mode shapes out.",
        license = @License(name = "MIT")))
class ApiDescription {
}
