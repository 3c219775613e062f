package org.sectio.cli;

import org.sectio.physics.ImpedanceDefinition;

/** The values of {@code --impedance}: which characteristic impedance is reported and used for a junction. */
enum ImpedanceChoice {
    /** Power–voltage, Z_PV = |V|² / (2P). */
    PV(ImpedanceDefinition.POWER_VOLTAGE),
    /** Power–current, Z_PI = 2P / |I|². */
    PI(ImpedanceDefinition.POWER_CURRENT),
    /** Voltage–current, Z_VI = V / I. */
    VI(ImpedanceDefinition.VOLTAGE_CURRENT);

    private final ImpedanceDefinition definition;

    ImpedanceChoice(ImpedanceDefinition definition) {
        this.definition = definition;
    }

    /** @return the definition this choice stands for */
    ImpedanceDefinition definition() {
        return definition;
    }
}
