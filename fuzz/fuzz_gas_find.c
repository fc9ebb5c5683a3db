/* fuzz_gas_find.c - gk_gas_find on arbitrary text.
   GK_OK: a pointer into the library's table (one of gk_gas_at(i)) holding physical data.
   Otherwise: *out untouched. */
#include "fuzz_common.h"

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size) {
    char *text = fz_string(data, size);
    static const gk_gas sentinel_gas = { 0 };
    const gk_gas *gas = &sentinel_gas;
    gk_status s = gk_gas_find(text, &gas);
    FZ_STATUS(s);
    if (s == GK_OK) {
        int in_table = 0;
        for (size_t i = 0; i < gk_gas_count(); ++i) {
            if (gk_gas_at(i) == gas) in_table = 1;
        }
        FZ_REQUIRE(in_table);
        FZ_REQUIRE(gas->name != NULL && gas->formula != NULL);
        FZ_POSITIVE(gas->molar_mass.kg_per_mol);
        FZ_POSITIVE(gas->critical_temperature.k);
        FZ_POSITIVE(gas->critical_pressure.pa);
        FZ_FINITE(gas->acentric_factor);
        /* Its own name and formula find it again. */
        const gk_gas *again = NULL;
        FZ_REQUIRE(gk_gas_find(gas->formula, &again) == GK_OK && again == gas);
        again = NULL;
        FZ_REQUIRE(gk_gas_find(gas->name, &again) == GK_OK && again == gas);
    } else {
        FZ_REQUIRE(gas == &sentinel_gas);
    }
    free(text);
    return 0;
}
