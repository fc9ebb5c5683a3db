/* fuzz_mixture_parse.c - gk_mixture_parse on arbitrary text.
   GK_OK: 1..GK_MIXTURE_MAX components from the gas table, fractions in [0, 1] summing to 1
   (within 1e-6 in double, 1e-5 in float, plus a hair for the rounding of this check's own
   sum), and a positive mixture molar mass.
   Otherwise: *out untouched (byte for byte). */
#include "fuzz_common.h"

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
    char *text = fz_string(data, size);
    gk_mixture mix, before;
    memset(&mix, 0xA5, sizeof mix);
    memcpy(&before, &mix, sizeof mix);
    gk_status s = gk_mixture_parse(text, &mix);
    FZ_STATUS(s);
    if (s == GK_OK) {
        FZ_REQUIRE(mix.count >= 1 && mix.count <= GK_MIXTURE_MAX);
        double sum = 0.0;
        for (size_t i = 0; i < mix.count; ++i) {
            FZ_REQUIRE(mix.gas[i] != NULL);
            FZ_REQUIRE(mix.mole_fraction[i] >= 0 && mix.mole_fraction[i] <= 1);
            sum += (double)mix.mole_fraction[i];
        }
        FZ_REQUIRE(fabs(sum - 1.0) <= (GK_REAL_IS_FLOAT ? 1e-5 : 1e-6) * (1.0 + 1e-6));
        gk_molar_mass m = { 0 };
        FZ_REQUIRE(gk_mixture_molar_mass(&mix, &m) == GK_OK);
        FZ_POSITIVE(m.kg_per_mol);
    } else {
        FZ_REQUIRE(memcmp(&mix, &before, sizeof mix) == 0);
    }
    free(text);
    return 0;
}
