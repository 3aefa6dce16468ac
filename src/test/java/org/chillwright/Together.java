package org.chillwright;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

/** Runs calls on their own threads, released at one barrier so that they really overlap; no sleeps. */
public final class Together {

    private static final long WAIT_S = 30;

    private Together() {
    }

    /** The results in the order of the calls. */
    public static <T> List<T> run(List<Callable<T>> calls) throws Exception {
        var barrier = new CyclicBarrier(calls.size());
        ExecutorService pool = Executors.newFixedThreadPool(calls.size());
        try {
            var futures = new ArrayList<Future<T>>();
            for (var call : calls) {
                futures.add(pool.submit(() -> {
                    barrier.await(WAIT_S, TimeUnit.SECONDS);
                    return call.call();
                }));
            }
            var results = new ArrayList<T>();
            for (var future : futures) {
                results.add(future.get(WAIT_S, TimeUnit.SECONDS));
            }
            return results;
        } finally {
            pool.shutdownNow();
        }
    }
}
