package org.nodewright;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;
import org.springframework.scheduling.annotation.EnableScheduling;

/** Starts the Nodewright server: string and air-column mode designer with a shop library. */
@SpringBootApplication
@EnableScheduling
public class NodewrightApplication {

    public static void main(String[] args) {
        SpringApplication.run(NodewrightApplication.class, args);
    }
}
