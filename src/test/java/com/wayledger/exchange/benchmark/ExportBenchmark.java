package com.wayledger.exchange.benchmark;

import com.wayledger.engine.demand.DiversityMethods;
import com.wayledger.exchange.BoardEntry;
import com.wayledger.exchange.ExchangeFixtures;
import com.wayledger.exchange.ExportData;
import com.wayledger.exchange.WorkbookWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Export of a generated site of 10,000 circuits (105 three-phase boards of up to 96 circuits, one
 * load each, fixed seed): both engines over the whole site, then the whole workbook (summary, 105
 * board sheets with their formulas, findings, methods) written by the streaming writer and thrown
 * away. Targets: at most 3 s per export, and the fork runs with a 256 MB heap ceiling (-Xmx256m),
 * so completing at all shows the peak heap stays under 256 MB; run with -prof gc for the allocation
 * figures.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 3)
@Fork(
    value = 1,
    jvmArgsAppend = {"-Xmx256m", "-Xms256m"})
public class ExportBenchmark {

  private List<BoardEntry> boards;
  private WorkbookWriter writer;
  private ExportData analysed;

  @Setup
  public void generate() {
    boards = ExchangeFixtures.generated(10_000, 96, 20_250_314L);
    writer = new WorkbookWriter(ExchangeFixtures.CAUTION);
    analysed = ExchangeFixtures.export(boards, DiversityMethods.UK_SMALL_SHOP);
  }

  /** The writing alone, engines already run: how the export's time splits. */
  @Benchmark
  public long writeOnly() throws IOException {
    CountingStream out = new CountingStream();
    writer.write(analysed, true, out);
    return out.bytes;
  }

  @Benchmark
  public long exportSite() throws IOException {
    ExportData data = ExchangeFixtures.export(boards, DiversityMethods.UK_SMALL_SHOP);
    CountingStream out = new CountingStream();
    writer.write(data, true, out);
    return out.bytes;
  }

  /** Counts what is written and keeps none of it. */
  static final class CountingStream extends OutputStream {
    long bytes;

    @Override
    public void write(int b) {
      bytes++;
    }

    @Override
    public void write(byte[] b, int off, int len) {
      bytes += len;
    }
  }
}
