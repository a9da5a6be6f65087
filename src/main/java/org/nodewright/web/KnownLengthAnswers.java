package org.nodewright.web;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import org.springframework.boot.web.servlet.FilterRegistrationBean;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.core.Ordered;
import org.springframework.web.filter.OncePerRequestFilter;
import org.springframework.web.util.ContentCachingResponseWrapper;
import org.springframework.web.util.WebUtils;

/**
 * Gives every API answer a {@code Content-Length}. Jackson streams its JSON, so without this the
 * server cannot know an answer's size when it starts writing, and Tomcat then compresses every
 * answer a gzip-accepting client asks for, whatever {@code server.compression.min-response-size}
 * says: a 52 kB string analysis spent more time being compressed on a loopback connection than
 * being computed and written. Buffered here, an answer under the threshold goes out plain and a
 * large one (an impedance curve) is still compressed. The change-event stream is left streaming;
 * a streamed download (a backup) is buffered until its async dispatch ends, as Spring's own
 * ShallowEtagHeaderFilter does.
 */
@Configuration(proxyBeanMethods = false)
public class KnownLengthAnswers {

    /** The server-sent event stream, which must never be buffered. */
    static final String EVENT_STREAM = "/api/v1/designs/events";

    @Bean
    FilterRegistrationBean<OncePerRequestFilter> knownLengthAnswersFilter() {
        FilterRegistrationBean<OncePerRequestFilter> registration = new FilterRegistrationBean<>(new Buffering());
        registration.addUrlPatterns("/api/*");
        // Outside every other filter, so that what they write (security headers, problems) is counted.
        registration.setOrder(Ordered.HIGHEST_PRECEDENCE);
        registration.setName("knownLengthAnswers");
        return registration;
    }

    static final class Buffering extends OncePerRequestFilter {

        @Override
        protected boolean shouldNotFilter(HttpServletRequest request) {
            String path = request.getRequestURI().substring(request.getContextPath().length());
            return path.startsWith(EVENT_STREAM);
        }

        /** A streamed body (a backup's StreamingResponseBody) finishes on an async dispatch: follow it there. */
        @Override
        protected boolean shouldNotFilterAsyncDispatch() {
            return false;
        }

        @Override
        protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
                throws ServletException, IOException {
            ContentCachingResponseWrapper buffered =
                    WebUtils.getNativeResponse(response, ContentCachingResponseWrapper.class);
            HttpServletResponse passed = response;
            if (buffered == null) {
                buffered = new ContentCachingResponseWrapper(response);
                passed = buffered;
            }
            try {
                chain.doFilter(request, passed);
            } finally {
                // An async request is written out on its last dispatch, which comes through here again.
                if (!request.isAsyncStarted()) {
                    buffered.copyBodyToResponse();
                }
            }
        }
    }
}
