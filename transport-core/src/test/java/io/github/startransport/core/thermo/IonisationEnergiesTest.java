package io.github.startransport.core.thermo;

import io.github.startransport.core.checks.CheckKind;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The ionisation energies of the Saha kernel against the NIST Atomic Spectra Database (values from memory). */
class IonisationEnergiesTest {

    @Test
    @Tag(CheckKind.EXTERNAL)
    void hydrogen() {
        // NIST: 13.598 434 6 eV; the Bohr value, the Rydberg energy 13.605 693 eV times m_p / (m_p + m_e) (CODATA
        // 2018), lies below it by about the relativistic and QED corrections, of relative order alpha^2 / 4
        assertEquals(13.5984346, SahaIonisation.CHI_H_EV, 2e-6);
        double bohr = 13.605693123 * 1.67262192369e-24 / (1.67262192369e-24 + 9.1093837015e-28);
        double alpha = 7.2973525693e-3;
        assertEquals(bohr, SahaIonisation.CHI_H_EV, 1.2 * alpha * alpha / 4 * bohr);
    }

    @Test
    @Tag(CheckKind.EXTERNAL)
    void heliumFirstAndSecond() {
        // NIST: He I 24.587 389 eV; He II 54.417 765 eV (hydrogen-like: 4 Rydberg m_He / (m_He + m_e))
        assertEquals(24.587389, SahaIonisation.CHI_HE1_EV, 2e-5);
        assertEquals(54.417765, SahaIonisation.CHI_HE2_EV, 2e-5);
        double reduced = 6.6446573357e-24 / (6.6446573357e-24 + 9.1093837015e-28); // alpha particle (CODATA 2018)
        double alpha = 7.2973525693e-3;
        double bohr = 4.0 * 13.605693123 * reduced;
        assertEquals(bohr, SahaIonisation.CHI_HE2_EV, 1.2 * (2 * alpha) * (2 * alpha) / 4 * bohr);
    }
}
