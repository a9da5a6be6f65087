package org.nodewright.designs;

import org.nodewright.NodewrightWebTest;

/** The saved-design contract on the embedded H2 file store, in a fresh data directory. */
@NodewrightWebTest
class DesignApiH2Test extends DesignApiContract {

}
