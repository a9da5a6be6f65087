package org.nodewright.store;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import org.springframework.context.annotation.Configuration;
import org.springframework.web.servlet.HandlerInterceptor;
import org.springframework.web.servlet.config.annotation.InterceptorRegistry;
import org.springframework.web.servlet.config.annotation.WebMvcConfigurer;

/** Every request that writes to the store first asks {@link DiskSpace} for room (507 when there is none). */
@Configuration(proxyBeanMethods = false)
class StoreWriteGuard implements WebMvcConfigurer {

    static final String[] WRITES = {"/api/v1/designs", "/api/v1/designs/**", "/api/v1/library/**", "/library/**",
            "/api/v1/accounts", "/api/v1/accounts/**", "/admin/**", "/account/**"};

    private final DiskSpace disk;

    StoreWriteGuard(DiskSpace disk) {
        this.disk = disk;
    }

    @Override
    public void addInterceptors(InterceptorRegistry registry) {
        registry.addInterceptor(new HandlerInterceptor() {
            @Override
            public boolean preHandle(HttpServletRequest request, HttpServletResponse response, Object handler) {
                String method = request.getMethod();
                if (!"GET".equals(method) && !"HEAD".equals(method) && !"OPTIONS".equals(method)) {
                    disk.requireRoomToWrite();
                }
                return true;
            }
        }).addPathPatterns(WRITES);
    }
}
