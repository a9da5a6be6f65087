package org.nodewright.designs;

import jakarta.servlet.http.HttpServletRequest;
import java.security.Principal;

/** Who is saving: the signed-in account when there are accounts, else the name given, else "local". */
final class Authors {

    static final String LOCAL = "local";

    private Authors() {
    }

    static String who(HttpServletRequest request, String given) {
        Principal principal = request.getUserPrincipal();
        if (principal != null && principal.getName() != null && !principal.getName().isBlank()) {
            return principal.getName();
        }
        if (given != null && !given.isBlank()) {
            String name = given.strip();
            return name.length() > 80 ? name.substring(0, 80) : name;
        }
        return LOCAL;
    }
}
