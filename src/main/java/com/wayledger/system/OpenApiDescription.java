package com.wayledger.system;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.info.Info;
import io.swagger.v3.oas.models.info.License;
import io.swagger.v3.oas.models.security.SecurityRequirement;
import io.swagger.v3.oas.models.security.SecurityScheme;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/** Title, caution and sign-in scheme of the JSON API's OpenAPI description. */
@Configuration
class OpenApiDescription {

  @Bean
  OpenAPI wayledgerApi() {
    return new OpenAPI()
        .info(
            new Info()
                .title("Wayledger API")
                .version("1")
                .description(
                    "Sites, boards, circuits and loads; demand after diversity; protection and cable findings;"
                        + " phase balancing; change log. Every request is signed in, preferably with a personal API token"
                        + " (create one on the account page; header Authorization: Bearer <token>; a read token acts"
                        + " as a viewer); HTTP Basic with the password also works but is slow, as it checks the password"
                        + " on every request. Reading needs the viewer role, changing needs editor."
                        + " Units follow the site's rule set: on a site whose rule set uses AWG and feet (NEC),"
                        + " circuits read and take cableLineSize and cableCpcSize as NEC size labels (\"12 AWG\","
                        + " \"250 kcmil\") and cableLengthFeet in feet (1 ft = 0.3048 m), boards submainLineSize,"
                        + " submainCpcSize and submainLengthFeet; elsewhere cableLineCsa/cableCpcCsa in mm² and"
                        + " cableLengthMetres (submain… alike). A field in the other units is refused with 422"
                        + " naming it and the field to send instead; a size that is no NEC size is refused too."
                        + " NEC circuits also take cableConduit (PVC, ALUMINUM or STEEL: the Chapter 9 Table 9"
                        + " column of the voltage drop; omitted: the conduit of the highest impedance is taken and"
                        + " the finding says so); a site under another rule set refuses it with 422."
                        + " Caution: figures assist a competent person; local wiring"
                        + " regulations and the current edition of the relevant standard govern; electrical work must be"
                        + " designed, done and certified by qualified people.")
                .license(new License().name("Apache-2.0")))
        .schemaRequirement(
            "token",
            new SecurityScheme()
                .type(SecurityScheme.Type.HTTP)
                .scheme("bearer")
                .description(
                    "Personal API token from the account page, scope read or read-and-change."))
        .schemaRequirement(
            "basic",
            new SecurityScheme()
                .type(SecurityScheme.Type.HTTP)
                .scheme("basic")
                .description(
                    "User name and password: the slow path (password hash on every call)."))
        .addSecurityItem(new SecurityRequirement().addList("token"))
        .addSecurityItem(new SecurityRequirement().addList("basic"));
  }
}
