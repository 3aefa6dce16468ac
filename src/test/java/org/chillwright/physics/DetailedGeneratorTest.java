package org.chillwright.physics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class DetailedGeneratorTest {

    private static final ModuleParameters TM_A = new ModuleParameters(0.04, 2.4, 0.25);
    private final DetailedSolver solver = new DetailedSolver();

    @Test
    void constantPropertiesReproduceTheLumpedGenerator() {
        // Identity: the ideal generator equations with heat exchangers (physics.md i, case S13 set-up).
        var c = new GeneratorCase(373.15, 298.15, 0.5, 0.3);
        GeneratorPoint lumped = new GeneratorSolver().atLoad(TM_A, c, 2.0);
        GeneratorPoint detailed = solver.generatorAtLoad(DetailedModule.ofConstantParameters(TM_A), c, 2.0)
                .orElseThrow().point();
        assertThat(detailed.currentA()).isCloseTo(lumped.currentA(), within(1e-6 * lumped.currentA()));
        assertThat(detailed.powerW()).isCloseTo(lumped.powerW(), within(1e-6 * lumped.powerW()));
        assertThat(detailed.hotJunctionK()).isCloseTo(lumped.hotJunctionK(), within(1e-6));
        assertThat(detailed.heatInW()).isCloseTo(lumped.heatInW(), within(1e-6 * lumped.heatInW()));
    }

    @Test
    void theDetailedGeneratorBalancesHeatAndPowerAcrossALargeDifference() {
        // First law: Qh,in − Qc,out = P (physics.md i); the network Th = Tsrc − Rhx,h·Qh,in.
        var c = new GeneratorCase(423.15, 293.15, 0.2, 0.2);
        DetailedGeneratorPoint p = solver.generatorAtLoad(DetailedSolverTest.BI2TE3_MODULE, c, 3.0).orElseThrow();
        GeneratorPoint g = p.point();
        double sourceK = g.hotJunctionK() + c.hotResistanceKPerW() * g.heatInW();
        assertThat(sourceK).isCloseTo(423.15, within(1e-6));
        assertThat(g.coldJunctionK()).isCloseTo(293.15 + c.coldResistanceKPerW() * g.heatOutW(), within(1e-6));
        assertThat(g.voltageV()).isCloseTo(g.currentA() * 3.0, within(1e-9));
        // the source side reaches above the set's 400 K here, and the result says so
        assertThat(p.highestLegK()).isGreaterThan(400);
        assertThat(p.withinMaterialRange()).isFalse();
    }

    @Test
    void theMostPowerIsAtLeastThePowerOnNeighbouringLoads() {
        var c = new GeneratorCase(373.15, 293.15, 0.3, 0.3);
        GeneratorPoint best = solver.generatorMaxPower(DetailedSolverTest.BI2TE3_MODULE, c).orElseThrow().point();
        for (double factor : new double[] {0.8, 1.25}) {
            GeneratorPoint other = solver.generatorAtLoad(DetailedSolverTest.BI2TE3_MODULE, c,
                    best.loadOhm() * factor).orElseThrow().point();
            assertThat(best.powerW()).isGreaterThanOrEqualTo(other.powerW());
        }
    }
}
