package org.nodewright.aircolumns;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.aircolumn.AirColumn;
import org.nodewright.physics.aircolumn.AirColumnAnalyzer;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.aircolumn.ToneHole;
import org.nodewright.physics.tuning.EqualTemperament;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.boot.context.event.ApplicationReadyEvent;
import org.springframework.context.event.EventListener;
import org.springframework.stereotype.Component;

/**
 * Once the server is ready, analyses a small demo bore a few times on a low-priority background
 * thread so that the JIT has compiled the transfer-matrix loops before the first real request.
 * {@code app.air-column.warm-up=false} turns it off (the tests do: there it only costs CPU).
 */
@Component
@ConditionalOnProperty(name = "app.air-column.warm-up", havingValue = "true", matchIfMissing = true)
class AirColumnWarmUp {

    @EventListener(ApplicationReadyEvent.class)
    void warmUp() {
        Thread t = new Thread(AirColumnWarmUp::run, "air-column-warm-up");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
    }

    private static void run() {
        List<BoreSegment> segs = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            double u = i / 40.0;
            double v = (i + 1) / 40.0;
            segs.add(new BoreSegment(0.01, 0.006 + 0.01 * u * u, 0.006 + 0.01 * v * v));
        }
        List<ToneHole> holes = List.of(new ToneHole(0.25, 0.003, 0.004, true), new ToneHole(0.3, 0.003, 0.004, false));
        for (OutputEnd end : OutputEnd.values()) {
            AirColumn col = new AirColumn(segs, holes, InputEnd.CLOSED, end, AirProperties.at(20, 50), true);
            for (int r = 0; r < 6; r++) {
                new AirColumnAnalyzer(EqualTemperament.ISO_16_A4_HZ, 201).analyze(col, 20, 3000, 4000, List.of());
            }
        }
    }
}
