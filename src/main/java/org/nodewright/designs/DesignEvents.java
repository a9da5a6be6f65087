package org.nodewright.designs;

import java.io.IOException;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.springframework.context.event.ContextClosedEvent;
import org.springframework.context.event.EventListener;
import org.springframework.http.MediaType;
import org.springframework.stereotype.Component;
import org.springframework.web.servlet.mvc.method.annotation.SseEmitter;

/**
 * Tells every open page at once when a design is saved or deleted (server-sent events). On
 * PostgreSQL the change also goes to the other app instances on the same database
 * ({@link PostgresChangeNotices}, LISTEN/NOTIFY), which pass it to their own pages; the design bar
 * also polls every 20 s as the fallback.
 */
@Component
class DesignEvents {

    /** A stream lives this long; the browser's EventSource reconnects on its own. */
    private static final long STREAM_MILLIS = 10 * 60 * 1000L;

    private final List<SseEmitter> emitters = new CopyOnWriteArrayList<>();
    private volatile java.util.function.Consumer<Change> forward = change -> { };

    /** Where this instance's own changes also go (the other instances, on PostgreSQL). */
    void forwardTo(java.util.function.Consumer<Change> forward) {
        this.forward = forward;
    }

    SseEmitter subscribe() {
        SseEmitter emitter = new SseEmitter(STREAM_MILLIS);
        emitters.add(emitter);
        emitter.onCompletion(() -> emitters.remove(emitter));
        emitter.onTimeout(() -> emitters.remove(emitter));
        emitter.onError(e -> emitters.remove(emitter));
        try {
            emitter.send(SseEmitter.event().name("hello").data("{}", MediaType.APPLICATION_JSON).reconnectTime(3000));
        } catch (IOException e) {
            emitters.remove(emitter);
        }
        return emitter;
    }

    void saved(Design d) {
        publish(new Change("saved", d.id(), d.kind().word(), d.name(), d.version(), d.updatedBy(), d.updatedAt()));
    }

    void deleted(Design d, String by, Instant at) {
        publish(new Change("deleted", d.id(), d.kind().word(), d.name(), d.version(), by, at));
    }

    private void publish(Change change) {
        publishLocally(change);
        forward.accept(change);
    }

    /** Sends a change to the pages open on this instance only. */
    void publishLocally(Change change) {
        for (SseEmitter emitter : emitters) {
            try {
                emitter.send(SseEmitter.event().name("design-" + change.change()).data(change, MediaType.APPLICATION_JSON));
            } catch (IOException | IllegalStateException e) {
                emitters.remove(emitter);
            }
        }
    }

    int subscribers() {
        return emitters.size();
    }

    /** Ends the open streams so that a graceful shutdown does not wait for them. */
    @EventListener(ContextClosedEvent.class)
    void closeAll() {
        for (SseEmitter emitter : emitters) {
            emitter.complete();
        }
        emitters.clear();
    }

    /** One change as sent to the pages. */
    record Change(String change, long id, String kind, String name, long version, String by, Instant at) {
    }
}
