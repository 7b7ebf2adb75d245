package io.github.startransport.core.constants;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The constants not covered by {@code ConstantsTest} against CODATA 2018 (Tiesinga et al. 2021, Rev. Mod. Phys.
 * 93, 025010): the electron volt and elementary charge are exact since the 2019 SI.
 */
class DerivedConstantsTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void electronVoltInErg() {
        // e = 1.602 176 634e-19 C exactly, so 1 eV = 1.602 176 634e-19 J = 1.602 176 634e-12 erg
        assertEquals(1.602176634e-12, Codata2018.ELECTRON_VOLT, 0.0);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void elementaryChargeInGaussianUnits() {
        // e in esu = e (C) * c (cm/s) / 10: 4.803 204 71e-10 statcoulomb (CODATA 2018 lists the SI value; the
        // Gaussian conversion is the textbook one)
        assertEquals(4.80320471e-10, Codata2018.ELEMENTARY_CHARGE_ESU, 1e-18);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void boltzmannConstantInElectronVoltsPerKelvin() {
        // CODATA 2018: k = 8.617 333 262e-5 eV/K (exact)
        assertEquals(8.617333262e-5, Codata2018.BOLTZMANN / Codata2018.ELECTRON_VOLT, 1e-14);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void dayIsEightySixThousandFourHundredSeconds() {
        // IAU: the day of 86 400 SI seconds
        assertEquals(86_400.0, Iau2015.DAY, 0.0);
        assertEquals(365.25, Iau2015.JULIAN_YEAR / Iau2015.DAY, 0.0);
    }
}
