package org.nodewright.sharing;

/** LAN mode cannot start as configured (no admin account and no admin password given). */
class LanSetupException extends RuntimeException {

    private final String action;

    LanSetupException(String problem, String action) {
        super(problem);
        this.action = action;
    }

    String action() {
        return action;
    }
}
