package org.chillwright.physics;

/**
 * What one stage of a solved stack does (the two-stage balance derived here). Both stages are wired in series, so both carry the
 * stack's one current at their terminals.
 *
 * @param moduleId          catalog id of the stage's module
 * @param seriesCount       modules in series per string
 * @param parallelCount     parallel strings
 * @param currentA          current at the stage's terminals (the shared current), A
 * @param perModuleCurrentA current through one module, currentA / parallelCount, A
 * @param voltageV          voltage across the stage, S(Thot − Tcold) + I·R of its equivalent module, V
 * @param powerW            electrical power of the stage, W
 * @param heatPumpedW       heat absorbed at the stage's cold face, W (for the hot stage: the cold stage's
 *                          rejected heat)
 * @param coldSideK         the stage's cold face, K
 * @param hotSideK          the stage's hot face, K
 * @param fractionOfImax    perModuleCurrentA / rated Imax of the module; NaN when not rated
 */
public record StackStage(long moduleId, int seriesCount, int parallelCount, double currentA, double perModuleCurrentA,
                         double voltageV, double powerW, double heatPumpedW, double coldSideK, double hotSideK,
                         double fractionOfImax) {

    /** Heat the stage releases at its hot face, heatPumpedW + powerW, W (first law). */
    public double heatRejectedW() {
        return heatPumpedW + powerW;
    }
}
