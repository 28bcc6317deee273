package com.wayledger.estate;

import com.wayledger.WayledgerApplication;
import com.wayledger.board.AnalysisService;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.springframework.boot.WebApplicationType;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.jdbc.core.simple.JdbcClient;

/**
 * Recomputes the analysis of every site of a database (the generated estate), one site after the
 * other on one thread, and prints the total time, the per-site median and slowest, and the peak
 * heap used. Nothing is kept between sites ({@code wayledger.analysis.kept-sites=0}), so the heap
 * bound is what one site's analysis needs. Run by {@code src/benchmark/estate.sh} with {@code
 * -XX:ActiveProcessorCount=1}; never by {@code ./mvnw verify}.
 */
public final class EstateAnalysis {

  private EstateAnalysis() {}

  private static long processCpuNanos() {
    return ManagementFactory.getOperatingSystemMXBean()
            instanceof com.sun.management.OperatingSystemMXBean os
        ? os.getProcessCpuTime()
        : -1;
  }

  public static void main(String[] args) {
    String url = args[0];
    String user = args.length > 1 ? args[1] : "postgres";
    String password = args.length > 2 ? args[2] : "";
    try (ConfigurableApplicationContext app =
        new SpringApplicationBuilder(WayledgerApplication.class)
            .web(
                WebApplicationType
                    .SERVLET) // the security setup needs the web layer; loopback, any free port
            .run(
                "--server.port=0",
                "--server.address=127.0.0.1",
                "--spring.datasource.url=" + url,
                "--spring.datasource.username=" + user,
                "--spring.datasource.password=" + password,
                "--wayledger.analysis.kept-sites=0",
                "--logging.level.root=WARN")) {
      AnalysisService analysis = app.getBean(AnalysisService.class);
      List<Long> sites =
          app.getBean(JdbcClient.class)
              .sql("SELECT id FROM site ORDER BY id")
              .query(Long.class)
              .list();
      List<Double> perSite = new ArrayList<>();
      long circuits = 0;
      long started = System.nanoTime();
      long threadCpuBefore = ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
      long processCpuBefore = processCpuNanos();
      for (long site : sites) {
        long one = System.nanoTime();
        circuits +=
            analysis.ofSite(site).spec().boards().stream()
                .mapToLong(board -> board.circuits().size())
                .sum();
        perSite.add((System.nanoTime() - one) / 1e6);
      }
      double total = (System.nanoTime() - started) / 1e9;
      double threadCpu =
          (ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime() - threadCpuBefore) / 1e9;
      double processCpu = (processCpuNanos() - processCpuBefore) / 1e9;
      Collections.sort(perSite);
      long peak = 0;
      for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
        if (pool.getType() == MemoryType.HEAP) {
          peak += pool.getPeakUsage().getUsed();
        }
      }
      System.out.printf(
          "Analysed %d sites (%d circuits) in %.1f s wall, %.1f s CPU of the analysing thread, %.1f s"
              + " CPU of the whole process (GC and JIT included), on %d processor(s): per site"
              + " median %.0f ms, slowest %.0f ms; peak heap used %d MB of max %d MB%n",
          sites.size(),
          circuits,
          total,
          threadCpu,
          processCpu,
          Runtime.getRuntime().availableProcessors(),
          perSite.isEmpty() ? 0 : perSite.get(perSite.size() / 2),
          perSite.isEmpty() ? 0 : perSite.get(perSite.size() - 1),
          peak / (1024 * 1024),
          Runtime.getRuntime().maxMemory() / (1024 * 1024));
    }
  }
}
