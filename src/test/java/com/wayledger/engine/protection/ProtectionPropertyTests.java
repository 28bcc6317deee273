package com.wayledger.engine.protection;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.SiteSpec;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;

class ProtectionPropertyTests {

  private static final double[] SIZES = {1.5, 2.5, 4, 6, 10, 16, 25, 35};
  private static final int PROPOSAL_SEEDS = 50;
  private static final InstallationMethod[] METHODS = {
    InstallationMethod.A1,
    InstallationMethod.A2,
    InstallationMethod.B1,
    InstallationMethod.B2,
    InstallationMethod.C,
    InstallationMethod.E
  };

  private static CircuitSpec randomCircuit(Random rnd, double line, double cpc) {
    CableSpec cable =
        new CableSpec(
            line,
            cpc,
            ConductorMaterial.COPPER,
            rnd.nextBoolean() ? Insulation.THERMOPLASTIC_70 : Insulation.THERMOSETTING_90,
            5 + 45 * rnd.nextDouble(),
            METHODS[rnd.nextInt(METHODS.length)],
            20.0 + 20 * rnd.nextDouble(),
            1 + rnd.nextInt(2),
            rnd.nextInt(4) == 0 ? 100 : 0);
    List<LoadSpec> loads = new ArrayList<>();
    loads.add(
        new LoadSpec(
            "m",
            rnd.nextBoolean() ? LoadCategory.MOTOR : LoadCategory.SOCKET_OUTLETS,
            1,
            1 + 10 * rnd.nextDouble(),
            RatingUnit.A,
            0.9,
            rnd.nextBoolean() ? 1 + 5 * rnd.nextDouble() : null,
            10.0,
            false));
    return Fixtures.circuit(1, Fixtures.mcb(TripCurve.B, 16), cable, loads);
  }

  private static SiteSpec randomSite(Random rnd, CircuitSpec c) {
    EarthingSystem e = EarthingSystem.values()[rnd.nextInt(3)];
    double ze =
        e == EarthingSystem.TT ? 20 + 180 * rnd.nextDouble() : 0.05 + 0.75 * rnd.nextDouble();
    return Fixtures.site(
        Fixtures.supply(e, ze, 1 + 9 * rnd.nextDouble()), Fixtures.originBoard(10, List.of(c)));
  }

  /** Seed {@code n}'s random circuit, site, design current and proposal. */
  private record Case(
      long seed, CircuitSpec circuit, SiteSpec site, double ib, DeviceProposal proposal) {}

  private static Case proposalCase(int n) {
    long seed = 0x5eed0000L + n;
    Random rnd = new Random(seed);
    int size = 1 + rnd.nextInt(SIZES.length - 1);
    CircuitSpec c = randomCircuit(rnd, SIZES[size], SIZES[size - 1]);
    SiteSpec site = randomSite(rnd, c);
    double ib = 1 + 15 * rnd.nextDouble();
    return new Case(
        seed,
        c,
        site,
        ib,
        DeviceProposer.propose(site, 1, new CircuitLoading(1, ib), ProtectionSettings.DEFAULTS));
  }

  @RepeatedTest(PROPOSAL_SEEDS)
  void aProposalPassesEveryCheckItClaimsWhenTheEngineRunsIt(RepetitionInfo info) {
    Case k = proposalCase(info.getCurrentRepetition());
    long seed = k.seed();
    DeviceProposal p = k.proposal();
    if (!p.found()) {
      assertThat(p.reasons()).as("seed %s: a refusal says why", seed).isNotEmpty();
      return;
    }
    Set<CheckKind> claimed = p.checks().stream().map(Finding::check).collect(Collectors.toSet());
    CircuitSpec fitted = Fixtures.withDevice(k.circuit(), p.device());
    SiteSpec refitted = Fixtures.site(k.site().supply(), Fixtures.originBoard(10, List.of(fitted)));
    SiteFindings r =
        ProtectionEngine.check(
            refitted,
            Map.of(1L, new CircuitLoading(1, k.ib())),
            Map.of(),
            ProtectionSettings.DEFAULTS);
    List<Finding> engineSays =
        r.boards().get(0).circuits().get(0).findings().stream()
            .filter(f -> claimed.contains(f.check()))
            .collect(Collectors.toList());
    assertThat(engineSays).as("seed %s: every claimed check is run", seed).hasSize(claimed.size());
    assertThat(engineSays)
        .as("seed %s, proposal %s", seed, p.device())
        .allSatisfy(
            f ->
                assertThat(f.verdict())
                    .as("seed %s: %s", seed, f.summary())
                    .isEqualTo(Verdict.PASS));
  }

  /**
   * Keeps the property above from passing vacuously: most generated circuits must get a proposal.
   */
  @org.junit.jupiter.api.Test
  void mostGeneratedCircuitsGetAProposal() {
    long found =
        java.util.stream.IntStream.rangeClosed(1, PROPOSAL_SEEDS)
            .filter(n -> proposalCase(n).proposal().found())
            .count();
    assertThat(found)
        .as("proposals found among seeds 0x5eed0001..%s", PROPOSAL_SEEDS)
        .isGreaterThanOrEqualTo(PROPOSAL_SEEDS / 2);
  }

  @RepeatedTest(50)
  void raisingTheCableSizeNeverMakesZsWorse(RepetitionInfo info) {
    long seed = 0x2e5e0000L + info.getCurrentRepetition();
    Random rnd = new Random(seed);
    int i = rnd.nextInt(SIZES.length - 1);
    int j = i + 1 + rnd.nextInt(SIZES.length - 1 - i);
    CircuitSpec small = randomCircuit(new Random(seed), SIZES[i], SIZES[i]);
    CircuitSpec large =
        new CircuitSpec(
            small.id(),
            small.wayNumber(),
            small.position(),
            small.description(),
            small.status(),
            false,
            small.device(),
            new CableSpec(
                SIZES[j],
                SIZES[j],
                small.cable().material(),
                small.cable().insulation(),
                small.cable().lengthMetres(),
                small.cable().installationMethod(),
                small.cable().ambientCelsius(),
                small.cable().groupedCircuits(),
                small.cable().thermalInsulationMillimetres()),
            small.loads(),
            null,
            null);
    SiteSpec site = randomSite(rnd, small);
    double zsSmall = zs(site, small);
    double zsLarge =
        zs(Fixtures.site(site.supply(), Fixtures.originBoard(10, List.of(large))), large);
    assertThat(zsLarge)
        .as("seed %s: %s mm² vs %s mm²", seed, SIZES[j], SIZES[i])
        .isLessThanOrEqualTo(zsSmall);
  }

  private static double zs(SiteSpec site, CircuitSpec c) {
    SiteSpec s = Fixtures.site(site.supply(), Fixtures.originBoard(10, List.of(c)));
    return ProtectionEngine.check(s, Map.of(), Map.of(), ProtectionSettings.DEFAULTS)
        .boards()
        .get(0)
        .circuits()
        .get(0)
        .loopImpedanceOhms()
        .value();
  }
}
