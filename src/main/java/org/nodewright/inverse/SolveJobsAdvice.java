package org.nodewright.inverse;

import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestControllerAdvice;

/**
 * The one answer of every solve endpoint when the queue is full: a 429 problem document. Ordered
 * before {@code web.ProblemAdvice}, whose catch-all would otherwise answer 500.
 */
@RestControllerAdvice(basePackageClasses = SolveJobs.class)
@Order(Ordered.HIGHEST_PRECEDENCE)
class SolveJobsAdvice {

    @ExceptionHandler(SolveJobs.Busy.class)
    ResponseEntity<ProblemDetail> busy(SolveJobs.Busy e) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.TOO_MANY_REQUESTS, e.getMessage());
        pd.setTitle("Solver busy");
        return ResponseEntity.status(HttpStatus.TOO_MANY_REQUESTS).contentType(MediaType.APPLICATION_PROBLEM_JSON).body(pd);
    }
}
