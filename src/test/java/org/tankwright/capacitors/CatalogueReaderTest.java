package org.tankwright.capacitors;

import org.junit.jupiter.api.Test;

import java.util.EnumSet;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CatalogueReaderTest {

    @Test
    void demoCatalogueLoadsFromTheClasspath() {
        Catalogue c = CatalogueReader.demo();
        assertTrue(c.parts().size() >= 200, "a few hundred parts, got " + c.parts().size());
        Set<Dielectric> kinds = EnumSet.noneOf(Dielectric.class);
        for (CapacitorPart p : c.parts()) {
            kinds.add(p.dielectric());
            assertTrue(Double.isFinite(p.srf()) && p.srf() > 1e5, p.id() + " SRF " + p.srf());
            assertTrue(p.hasAcRating(), p.id());
            assertTrue(p.note().contains("from memory"), p.id() + " marks its ratings as recalled");
        }
        assertTrue(kinds.containsAll(EnumSet.of(Dielectric.POLYPROPYLENE, Dielectric.C0G, Dielectric.MICA)));
    }

    @Test
    void csvWithUnitsReadsLikeJson() {
        String csv = "id,capacitance_F,tolerance,dielectric,tan_delta,tan_delta_frequency_Hz,esl_H,dc_rating_V,ac_rating_V,current_rating_A,ac_rating_table,note\n"
                + "A1,4n7,5%,polypropylene,2e-4,1k,8n,1600,550,6,\"1k:550;100k:300\",\"test, with comma\"\n"
                + "A2,1e-8,0.02,np0,0.001,1MHz,2nH,1000 V,300,3A,,\n";
        Catalogue c = CatalogueReader.readCsv(csv, "t.csv");
        assertEquals(2, c.parts().size());
        CapacitorPart a = c.part("A1");
        assertEquals(4.7e-9, a.capacitance(), 1e-21);
        assertEquals(0.05, a.tolerance(), 1e-15);
        assertEquals(8e-9, a.esl(), 1e-21);
        assertEquals(300, a.acRatingTable().get(1).voltageRms(), 0);
        assertEquals("test, with comma", a.note());
        assertEquals(Dielectric.C0G, c.part("A2").dielectric());
        assertEquals(3, c.part("A2").currentRating(), 0);
    }

    @Test
    void problemsNameRowFieldValueAndWhatIsAllowed() {
        String csv = "id,capacitance_F,tolerance,dielectric,tan_delta,esl_H,dc_rating_V,current_rating_A\n"
                + "A1,4n7,5%,polypropylene,2e-4,8n,1600,6\n"
                + "A2,-1n,5%,polypropylene,2e-4,8n,1600,6\n"
                + "A3,1n,5%,paper,2e-4,8n,1600,6\n"
                + "A1,1n,5%,mica,2e-4,8n,12 kg,6\n";
        CatalogueException e = assertThrows(CatalogueException.class, () -> CatalogueReader.readCsv(csv, "bad.csv"));
        String m = e.getMessage();
        assertTrue(m.contains("row 3") && m.contains("capacitance_F") && m.contains("-1") && m.contains("positive"), m);
        assertTrue(m.contains("row 4") && m.contains("paper") && m.contains("polypropylene"), m);
        assertTrue(m.contains("row 5") && m.contains("dc_rating_V") && m.contains("12 kg"), m);
    }

    @Test
    void jsonFormatAndVersionAreChecked() {
        assertTrue(assertThrows(CatalogueException.class, () -> CatalogueReader.readJson("{\"format\":\"x\"}", "f.json"))
                .getMessage().contains(Catalogue.FORMAT));
        String v2 = "{\"format\":\"" + Catalogue.FORMAT + "\",\"version\":2,\"parts\":[]}";
        assertTrue(assertThrows(CatalogueException.class, () -> CatalogueReader.readJson(v2, "f.json"))
                .getMessage().contains("version"));
        String unknown = "{\"format\":\"" + Catalogue.FORMAT + "\",\"version\":1,\"parts\":[{\"id\":\"a\",\"capacitance\":1e-9}]}";
        String m = assertThrows(CatalogueException.class, () -> CatalogueReader.readJson(unknown, "f.json")).getMessage();
        assertTrue(m.contains("part 1") && m.contains("'capacitance' is not known") && m.contains("capacitance_F"), m);
    }

    @Test
    void deratingRulesAreData() {
        DeratingRules r = DeratingRules.fromJson("{\"current_fraction\": 0.6, \"allow_class2\": true}");
        assertEquals(0.6, r.currentFraction(), 0);
        assertTrue(r.allowClass2());
        assertEquals(DeratingRules.COMMON_PRACTICE.srfFactor(), r.srfFactor(), 0, "keys left out keep the default");
        String m = assertThrows(IllegalArgumentException.class, () -> DeratingRules.fromJson("{\"current_fraction\": 1.5}")).getMessage();
        assertTrue(m.contains("current_fraction") && m.contains("1.5") && m.contains("(0, 1]"), m);
    }
}
