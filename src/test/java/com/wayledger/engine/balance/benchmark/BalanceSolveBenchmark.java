package com.wayledger.engine.balance.benchmark;

import com.wayledger.engine.balance.BalanceProblem;
import com.wayledger.engine.balance.BalanceResult;
import com.wayledger.engine.balance.PhaseBalancer;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Per-board solve time of the optimal mode over the 1,000 generated 72-circuit boards, cycling
 * through them; sample mode reports the median (p0.50) and p0.99 across boards.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class BalanceSolveBenchmark {

  private List<BalanceProblem> boards;
  private PhaseBalancer balancer;
  private int next;

  @Setup(Level.Trial)
  public void generate() {
    boards = RealisticBoards.generate(1_000);
    balancer = new PhaseBalancer();
  }

  @Benchmark
  public BalanceResult optimiseOneBoard() {
    BalanceProblem board = boards.get(next);
    next = (next + 1) % boards.size();
    return balancer.optimise(board);
  }
}
