package org.chillwright.physics;

/**
 * Solids a cooled part, its cold plate or a heat sink is commonly made of, with their density and specific heat
 * capacity at 300 K as printed in F.P. Incropera, D.P. DeWitt, T.L. Bergman &amp; A.S. Lavine, Fundamentals of
 * Heat and Mass Transfer, 7th ed., Wiley 2011, Table A.1 (metallic solids) and Table A.2 (nonmetallic solids),
 * except where a constant says "from memory". The table values were read in a copy of the book's appendix; the
 * heat capacity of most of these solids changes by a few percent between 250 K and 300 K, which a lumped
 * cool-down estimate ignores.
 */
public enum Material {
    /** Aluminium, pure: 2702 kg/m³, 903 J/(kg·K) (Table A.1). */
    ALUMINIUM(2702, 903),
    /** Aluminium alloy 2024-T6: 2770 kg/m³, 875 J/(kg·K) (Table A.1). */
    ALUMINIUM_2024_T6(2770, 875),
    /** Copper, pure: 8933 kg/m³, 385 J/(kg·K) (Table A.1). */
    COPPER(8933, 385),
    /** Cartridge brass (70 % Cu, 30 % Zn): 8530 kg/m³, 380 J/(kg·K) (Table A.1). */
    BRASS(8530, 380),
    /** Stainless steel AISI 304: 7900 kg/m³, 477 J/(kg·K) (Table A.1, from memory). */
    STAINLESS_STEEL_304(7900, 477),
    /** Stainless steel AISI 316: 8238 kg/m³, 468 J/(kg·K) (Table A.1). */
    STAINLESS_STEEL_316(8238, 468),
    /** Gold: 19300 kg/m³, 129 J/(kg·K) (Table A.1). */
    GOLD(19300, 129),
    /** Silver: 10500 kg/m³, 235 J/(kg·K) (Table A.1). */
    SILVER(10500, 235),
    /** Nickel, pure: 8900 kg/m³, 444 J/(kg·K) (Table A.1). */
    NICKEL(8900, 444),
    /** Titanium: 4500 kg/m³, 522 J/(kg·K) (Table A.1). */
    TITANIUM(4500, 522),
    /** Molybdenum: 10240 kg/m³, 251 J/(kg·K) (Table A.1). */
    MOLYBDENUM(10240, 251),
    /** Tungsten: 19300 kg/m³, 132 J/(kg·K) (Table A.1). */
    TUNGSTEN(19300, 132),
    /** Silicon: 2330 kg/m³, 712 J/(kg·K) (Table A.1). */
    SILICON(2330, 712),
    /** Germanium: 5360 kg/m³, 322 J/(kg·K) (Table A.1). */
    GERMANIUM(5360, 322),
    /** Aluminium oxide (alumina), polycrystalline: 3970 kg/m³, 765 J/(kg·K) (Table A.2). */
    ALUMINA(3970, 765),
    /** Aluminium oxide, sapphire: 3970 kg/m³, 765 J/(kg·K) (Table A.2). */
    SAPPHIRE(3970, 765),
    /** Beryllium oxide: 3000 kg/m³, 1030 J/(kg·K) (Table A.2). Its dust is toxic: machining needs precautions. */
    BERYLLIUM_OXIDE(3000, 1030),
    /** Silicon carbide: 3160 kg/m³, 675 J/(kg·K) (Table A.2). */
    SILICON_CARBIDE(3160, 675);

    private final double densityKgPerM3;
    private final double specificHeatJPerKgK;

    Material(double densityKgPerM3, double specificHeatJPerKgK) {
        this.densityKgPerM3 = densityKgPerM3;
        this.specificHeatJPerKgK = specificHeatJPerKgK;
    }

    /** Density at 300 K, kg/m³. */
    public double densityKgPerM3() {
        return densityKgPerM3;
    }

    /** Specific heat capacity at 300 K, J/(kg·K). */
    public double specificHeatJPerKgK() {
        return specificHeatJPerKgK;
    }
}
