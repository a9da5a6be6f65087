package org.nodewright.sharing;

import java.time.OffsetDateTime;

/** An account as listed: never any password material. */
public record Account(long id, String username, Role role, boolean enabled,
        OffsetDateTime createdAt, OffsetDateTime updatedAt) {
}
