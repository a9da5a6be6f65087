package org.nodewright;

import java.nio.file.Path;
import java.util.Optional;
import org.nodewright.store.StoreRestore;
import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;
import org.springframework.scheduling.annotation.EnableScheduling;

/** Starts the Nodewright server: string and air-column mode designer with a shop library. */
@SpringBootApplication
@EnableScheduling
public class NodewrightApplication {

    public static void main(String[] args) {
        // --app.restore=FILE: restore a backup into an empty --app.data-dir and exit, without starting the server.
        Optional<String> restore = option(args, "app.restore");
        if (restore.isPresent()) {
            String dataDir = option(args, "app.data-dir").orElse("./data");
            System.exit(new StoreRestore(System.out).restore(Path.of(restore.get()), Path.of(dataDir)));
        }
        SpringApplication.run(NodewrightApplication.class, args);
    }

    /** A {@code --name=value} option of the command line (the last one given wins). */
    static Optional<String> option(String[] args, String name) {
        String value = null;
        for (String a : args) {
            if (a.startsWith("--" + name + "=")) {
                value = a.substring(name.length() + 3);
            }
        }
        return Optional.ofNullable(value);
    }
}
