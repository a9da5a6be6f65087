package org.nodewright.designs;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;
import javax.sql.DataSource;
import org.postgresql.PGConnection;
import org.postgresql.PGNotification;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.context.SmartLifecycle;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Component;
import tools.jackson.databind.json.JsonMapper;

/**
 * Change notices between app instances on one PostgreSQL database: every save and delete is sent
 * with {@code pg_notify} on the channel {@value #CHANNEL}, and a listening connection of each
 * instance hands the notices of the others to its own event stream. On H2 (one instance per store)
 * this stays idle and the in-process path alone serves. If the listening connection drops, it is
 * opened again; meanwhile the design bar's 20 s poll keeps the pages current.
 */
@Component
class PostgresChangeNotices implements SmartLifecycle {

    static final String CHANNEL = "nodewright_designs";
    /** How long one wait for notices lasts before the loop checks whether it should stop. */
    static final int WAIT_MILLIS = 500;
    private static final Logger log = LoggerFactory.getLogger(PostgresChangeNotices.class);

    private final DataSource dataSource;
    private final JdbcClient jdbc;
    private final JsonMapper mapper;
    private final DesignEvents events;
    private final String instance = UUID.randomUUID().toString();
    private volatile boolean running;
    private volatile Boolean postgres;
    private Thread listener;

    PostgresChangeNotices(DataSource dataSource, JdbcClient jdbc, JsonMapper mapper, DesignEvents events) {
        this.dataSource = dataSource;
        this.jdbc = jdbc;
        this.mapper = mapper;
        this.events = events;
        events.forwardTo(this::send);
    }

    /** A notice as sent between instances: who sent it, and the change. */
    record Notice(String from, DesignEvents.Change change) {
    }

    boolean onPostgres() {
        if (postgres == null) {
            try (Connection c = dataSource.getConnection()) {
                postgres = c.isWrapperFor(PGConnection.class);
            } catch (SQLException e) {
                postgres = false;
            }
        }
        return postgres;
    }

    void send(DesignEvents.Change change) {
        if (!onPostgres()) {
            return;
        }
        try {
            jdbc.sql("SELECT pg_notify(?, ?)").params(CHANNEL, mapper.writeValueAsString(new Notice(instance, change)))
                    .query((rs, n) -> 1).list();
        } catch (RuntimeException e) {
            log.warn("Change notice not sent to the other instances ({}); their pages catch up by polling.",
                    e.getMessage());
        }
    }

    @Override
    public void start() {
        if (!onPostgres()) {
            return;
        }
        running = true;
        listener = new Thread(this::listen, "nodewright-pg-notices");
        listener.setDaemon(true);
        listener.start();
    }

    private void listen() {
        while (running) {
            try (Connection c = dataSource.getConnection()) {
                try (Statement s = c.createStatement()) {
                    s.execute("LISTEN " + CHANNEL);
                }
                PGConnection pg = c.unwrap(PGConnection.class);
                while (running) {
                    PGNotification[] notices = pg.getNotifications(WAIT_MILLIS);
                    if (notices == null) {
                        continue;
                    }
                    for (PGNotification n : notices) {
                        receive(n.getParameter());
                    }
                }
            } catch (SQLException | RuntimeException e) {
                if (running) {
                    log.warn("Listening for change notices failed ({}); trying again in 2 s.", e.getMessage());
                    sleep(2000);
                }
            }
        }
    }

    void receive(String payload) {
        try {
            Notice notice = mapper.readValue(payload, Notice.class);
            if (!instance.equals(notice.from())) {
                events.publishLocally(notice.change());
            }
        } catch (RuntimeException e) {
            log.warn("Unreadable change notice ignored: {}", e.getMessage());
        }
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    @Override
    public void stop() {
        running = false;
        if (listener != null) {
            listener.interrupt();
            try {
                listener.join(2000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    @Override
    public boolean isRunning() {
        return running;
    }
}
