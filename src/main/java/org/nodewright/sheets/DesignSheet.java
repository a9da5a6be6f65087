package org.nodewright.sheets;

import java.util.function.Function;

/**
 * The bench sheet of a design kind, offered by the feature that owns the kind's request type (one
 * bean per request type, like {@link org.nodewright.web.DesignTable}). The sheet endpoints read a
 * design's parameters into {@link #requestType()}, validate them and ask for the sheet's content.
 */
public interface DesignSheet {

    /** The request record this sheet reads (the design kind's request class). */
    Class<?> requestType();

    /** The analysed content of a validated request. */
    BenchSheet sheet(Object request);

    static <R> DesignSheet of(Class<R> type, Function<R, BenchSheet> maker) {
        return new DesignSheet() {
            @Override
            public Class<?> requestType() {
                return type;
            }

            @Override
            public BenchSheet sheet(Object request) {
                return maker.apply(type.cast(request));
            }
        };
    }
}
