package coilwright.load;

import java.util.List;

/**
 * Per-cell voltages of the supported chemistries (for the catalogue shown to users).
 * <ul>
 * <li>Lead-acid: 2.0 V nominal; absorption 2.40 V (2.35-2.45 V); float 2.25 V per cell at 25 C. From memory of
 * VRLA manufacturers' application manuals; IEEE 1188 defers float voltage to the manufacturer.</li>
 * <li>LiFePO4: 3.2 V nominal; absorption 3.55 V (3.45-3.65 V); float 3.375 V per cell. From memory of
 * LiFePO4 cell datasheets and battery-management manuals.</li>
 * </ul>
 */
public final class BatteryChemistries {
    /**
     * One chemistry's per-cell voltages.
     *
     * @param chemistry      the chemistry
     * @param nominalCellV   nominal (resting) cell voltage, V
     * @param absorbCellV    absorption (bulk-end) charging voltage, V per cell
     * @param floatCellV     float charging voltage, V per cell
     * @param absorbMinCellV lower end of the usual absorption range, V per cell
     * @param absorbMaxCellV upper end of the usual absorption range, V per cell
     * @param source         where the figures come from
     */
    public record CellVoltages(Chemistry chemistry, double nominalCellV, double absorbCellV, double floatCellV,
                               double absorbMinCellV, double absorbMaxCellV, String source) {
        /** The cell voltage for a charge stage, V. */
        public double cellV(ChargeStage stage) {
            return switch (stage) {
                case NOMINAL -> nominalCellV;
                case ABSORB -> absorbCellV;
                case FLOAT -> floatCellV;
            };
        }
    }

    public static final CellVoltages LEAD_ACID = new CellVoltages(Chemistry.LEAD_ACID, 2.0, 2.40, 2.25, 2.35, 2.45,
            "from memory: VRLA manufacturers' application manuals (float about 2.25 V/cell at 25 C)");
    public static final CellVoltages LIFEPO4 = new CellVoltages(Chemistry.LIFEPO4, 3.2, 3.55, 3.375, 3.45, 3.65,
            "from memory: LiFePO4 cell datasheets (3.2 V nominal, charge limit 3.65 V/cell)");

    private BatteryChemistries() {
    }

    /** Every chemistry with fixed per-cell voltages (CUSTOM has none: the user gives the bank voltage). */
    public static List<CellVoltages> all() {
        return List.of(LEAD_ACID, LIFEPO4);
    }

    /** The per-cell voltages of a chemistry. @throws IllegalArgumentException for CUSTOM */
    public static CellVoltages of(Chemistry chemistry) {
        return switch (chemistry) {
            case LEAD_ACID -> LEAD_ACID;
            case LIFEPO4 -> LIFEPO4;
            case CUSTOM -> throw new IllegalArgumentException("chemistry = CUSTOM has no per-cell voltages");
        };
    }
}
