package io.github.startransport.cli;

import io.github.startransport.spi.ProfileColumn;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ColumnMapTest {

    @Test
    void everyHeaderNameIsAcceptedOnOurSideInAnyCase() {
        for (ProfileColumn c : ProfileColumn.values()) {
            assertEquals(c, ColumnMap.ourColumn(c.header()));
            assertEquals(c, ColumnMap.ourColumn(c.header().toUpperCase(java.util.Locale.ROOT)));
        }
        assertEquals(ProfileColumn.TEMPERATURE, ColumnMap.ourColumn("temperature"));
        assertEquals(ProfileColumn.DENSITY, ColumnMap.ourColumn("Density"));
        assertEquals(ProfileColumn.OPACITY, ColumnMap.ourColumn("kappa"));
        assertNull(ColumnMap.ourColumn("temprature"));
    }

    @Test
    void leftSideIsTheFilesRightSideIsOurs() {
        ColumnMap map = ColumnMap.parse("Temp=temperature,Dens=rho_g_cm3");
        assertEquals("Temp", map.fileHeader(ProfileColumn.TEMPERATURE));
        assertEquals("Dens", map.fileHeader(ProfileColumn.DENSITY));
        assertEquals("r_cm", map.fileHeader(ProfileColumn.RADIUS));
        assertTrue(map.maps(ProfileColumn.TEMPERATURE));
        assertFalse(map.maps(ProfileColumn.RADIUS));
    }

    @Test
    void unknownNameOnOurSideIsRefusedByName() {
        UsageException e = assertThrows(UsageException.class, () -> ColumnMap.parse("Temp=temprature"));
        assertTrue(e.getMessage().contains("'temprature'"), e.getMessage());
    }

    @Test
    void malformedItemsAndDoubleMappingsAreRefused() {
        assertThrows(UsageException.class, () -> ColumnMap.parse("temperature"));
        assertThrows(UsageException.class, () -> ColumnMap.parse("=temperature,D=density"));
        assertThrows(UsageException.class, () -> ColumnMap.parse("A=temperature,B=T_K"));
        assertThrows(UsageException.class, () -> ColumnMap.parse("A=temperature,A=density"));
        assertThrows(UsageException.class, () -> ColumnMap.parse("A=temperature,"));
    }
}
