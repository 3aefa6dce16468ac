package org.chillwright.catalog;

import org.chillwright.physics.MaxRatings;
import org.chillwright.physics.ModuleParameters;
import org.chillwright.physics.Units;

/**
 * The lumped parameters and the listing ratings of a definition, both from the physics engine:
 * a rated module keeps its stated ratings and gets its parameters by its ratings method; a
 * constructed module gets its parameters from its legs and ideal ratings at the reference hot side.
 */
record ModuleDerivation(ModuleParameters parameters, MaxRatings ratings) {

    static ModuleDerivation of(ModuleDefinition definition) {
        if (definition.ratings() != null) {
            MaxRatings stated = definition.ratings().toMaxRatings();
            return new ModuleDerivation(ModuleParameters.fromRatings(stated, definition.ratings().method()), stated);
        }
        ModuleParameters parameters = definition.construction().toLegConstruction().toParameters();
        double referenceK = Units.kelvinFromCelsius(CatalogService.CONSTRUCTION_REFERENCE_HOT_SIDE_C);
        return new ModuleDerivation(parameters, parameters.ratingsAt(referenceK));
    }
}
