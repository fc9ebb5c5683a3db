/*
 * gas.c - the built-in gas table and its lookup by formula or name.
 *
 * Conventions
 * - name: lower-case English name, IUPAC spelling where the trade uses it ("sulfur dioxide"),
 *   the trade name where that is what engineers say ("isobutane", "ethylene", "propylene",
 *   "acetylene"). Matched without regard to ASCII case. A row may list up to GK__ALIAS_MAX
 *   further names (British spellings, IUPAC names, refrigerant numbers) matched the same way.
 * - formula: the molecular formula as chemists write it, case-sensitive ("CO" is carbon
 *   monoxide, "Co" is nothing here). Isomers carry the usual prefix: "n-C4H10", "i-C4H10".
 *   R-134a is written as the condensed structural formula "CH2FCF3" (C2H2F4 would not tell it
 *   from R-134, CHF2CHF2). Air is the pseudo-pure gas "air".
 * - Every value is SI: kg/mol, K, Pa, Pa m^6/mol^2, m^3/mol, m.
 *
 * Sources (short tags used in the rows; "from memory" = recalled without the document at hand,
 * values checked against each other in tests/test_gases.c, not against the printed page):
 * [AW]      Molar masses are computed from the IUPAC/CIAAW standard atomic weights 2021, taking
 *           the conventional value where IUPAC gives an interval, as listed in the IUPAC
 *           abridged table (from memory): H 1.008, He 4.002602, C 12.011, N 14.007, O 15.999,
 *           F 18.998403162, Ne 20.1797, S 32.06, Cl 35.45, Ar 39.95, Kr 83.798, Xe 131.293.
 *           Each row's comment gives the sum; the literal is that sum, not rounded further.
 * [ISO2533] ISO 2533:1975 Standard Atmosphere (= U.S. Standard Atmosphere 1976 at sea level):
 *           molar mass of dry air 28.9644 g/mol, ratio of specific heats 1.40 (from memory).
 * [AIRPC]   Air is a mixture with no true critical point; its pseudo-critical constants
 *           Tc 132.5 K, Pc 3.77 MPa and acentric factor 0.035 are common-practice approximate
 *           values (from memory; cf. the maxcondentherm 132.63 K / 3.785 MPa of Lemmon et al.,
 *           J. Phys. Chem. Ref. Data 29 (2000) 331). Good for cubic equations of state away
 *           from the two-phase region only.
 * [PPO5]    B. E. Poling, J. M. Prausnitz, J. P. O'Connell, The Properties of Gases and
 *           Liquids, 5th ed. (McGraw-Hill 2001), Appendix A: Tc, Pc, omega (from memory). The
 *           acentric factor of neon is the least certain (published values -0.04 ... -0.016).
 * [IAPWS]   Critical point of water: 647.096 K, 22.064 MPa (IAPWS, Release on the values of
 *           temperature, pressure and density of ordinary and heavy water substances at their
 *           respective critical points, 1992; from memory).
 * [TRB94]   R. Tillner-Roth, H. D. Baehr, J. Phys. Chem. Ref. Data 23 (1994) 657, R-134a
 *           (critical point 374.21 K, 4.0593 MPa and ideal-gas heat capacity, from memory; the
 *           acentric factor 0.3268 from the vapour pressure of that equation at Tr = 0.7,
 *           from memory).
 * [CRC-vdW] CRC Handbook of Chemistry and Physics, "Van der Waals constants for gases" (older
 *           formula-ordered table); [CRC-vdW-new] the newer CRC table (CO2, H2). Values from
 *           memory of those tables, converted with 1 bar L2/mol2 = 0.1 Pa m6/mol2 and 1 L/mol =
 *           1e-3 m3/mol. Other gases carry 0: callers derive a, b from Tc, Pc.
 * [JANAF]   NIST-JANAF Thermochemical Tables, 4th ed. (1998), Cp at 298.15 K (from memory);
 *           [TRC] TRC / CRC tables of ideal-gas heat capacities of hydrocarbons at 298.15 K
 *           (from memory). gamma = cp / (cp - R) of the ideal gas, R = 8.314462618 J/(mol K).
 *           Monatomic gases: 5/3 exactly (kinetic theory, no internal degrees of freedom).
 * [LJ]      Lennard-Jones collision diameter sigma fitted to viscosity, R. A. Svehla, NASA
 *           TR R-132 (1962), as tabulated in [PPO5] Appendix B (from memory). This is the
 *           value engineers use as "the" molecular diameter in mean-free-path estimates; it
 *           is not a rigid-sphere diameter. 0 where the gas is not in that table.
 */
#include "gas_internal.h"

/* Most aliases per row. */
#define GK__ALIAS_MAX 3

/* A table row: the public gk_gas plus its further names. gk_gas_at() returns &row.gas. The
   further names are one string, each name ended by a NUL and the list by an empty name (one
   pointer per row instead of GK__ALIAS_MAX: firmware size), or NULL for none. */
typedef struct gk__gas_row {
    gk_gas gas;
    const char *aliases;
} gk__gas_row;

/* clang-format off */
#define GK__ROW(name, formula, m, tc, pc, omega, a, b, gamma, sigma, alias)                     \
    { { (name), (formula), { GK_LIT(m) }, { GK_LIT(tc) }, { GK_LIT(pc) }, GK_LIT(omega),       \
        GK_LIT(a), GK_LIT(b), GK_LIT(gamma), GK_LIT(sigma) },                                  \
      (alias) }
#define GK__NO_ALIAS NULL

/* Columns of GK__ROW: name, formula, molar mass (kg/mol), Tc (K), Pc (Pa), acentric factor,
   van der Waals a (Pa m6/mol2), b (m3/mol), ideal-gas cp/cv near 298 K, collision diameter (m),
   aliases. The comment beside each column names its source tag (see the top of the file). */
static const gk__gas_row gk__gases[] = {
    /* air */
    GK__ROW("air", "air",
            28.9644e-3,                 /* M: 28.9644 g/mol [ISO2533] */
            132.5, 3.77e6, 0.035,       /* Tc, Pc, omega: pseudo-critical [AIRPC, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.4,                        /* gamma: 1.40 [ISO2533] */
            3.711e-10,                  /* sigma, m: [LJ, from memory] */
            "dry air" "\0"),
    /* nitrogen */
    GK__ROW("nitrogen", "N2",
            28.014e-3,                  /* M: 2 x 14.007 g/mol [AW] */
            126.192, 3.3958e6, 0.037,   /* Tc, Pc: Span et al., J. Phys. Chem. Ref. Data 29 (2000) 1361 (reference EOS, from memory); omega [PPO5] */
            0.137, 3.87e-05,            /* a, b: 1.370 bar L2/mol2, 0.0387 L/mol [CRC-vdW] */
            1.3996,                     /* gamma: cp 29.124 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.798e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* oxygen */
    GK__ROW("oxygen", "O2",
            31.998e-3,                  /* M: 2 x 15.999 g/mol [AW] */
            154.581, 5.043e6, 0.022,    /* Tc, Pc: Schmidt and Wagner, Fluid Phase Equilib. 19 (1985) 175 (reference EOS, from memory); omega [PPO5] */
            0.1382, 3.186e-05,          /* a, b: 1.382 bar L2/mol2, 0.03186 L/mol [CRC-vdW] */
            1.3947,                     /* gamma: cp 29.378 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.467e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* argon */
    GK__ROW("argon", "Ar",
            39.95e-3,                   /* M: 39.95 g/mol [AW] */
            150.687, 4.863e6, -0.002,   /* Tc, Pc: Tegeler et al., J. Phys. Chem. Ref. Data 28 (1999) 779 (reference EOS, from memory); omega [PPO5] */
            0.1355, 3.201e-05,          /* a, b: 1.355 bar L2/mol2, 0.03201 L/mol [CRC-vdW] */
            1.6666666666666667,         /* gamma: 5/3, monatomic ideal gas (kinetic theory) */
            3.542e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* helium */
    GK__ROW("helium", "He",
            4.002602e-3,                /* M: 4.002602 g/mol [AW] */
            5.19, 0.227e6, -0.39,       /* Tc, Pc, omega: [PPO5, from memory] */
            0.00346, 2.38e-05,          /* a, b: 0.0346 bar L2/mol2, 0.0238 L/mol [CRC-vdW] */
            1.6666666666666667,         /* gamma: 5/3, monatomic ideal gas (kinetic theory) */
            2.551e-10,                  /* sigma, m: [LJ, from memory] */
            "helium-4" "\0"),
    /* neon */
    GK__ROW("neon", "Ne",
            20.1797e-3,                 /* M: 20.1797 g/mol [AW] */
            44.4, 2.76e6, -0.029,       /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.6666666666666667,         /* gamma: 5/3, monatomic ideal gas (kinetic theory) */
            2.82e-10,                   /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* krypton */
    GK__ROW("krypton", "Kr",
            83.798e-3,                  /* M: 83.798 g/mol [AW] */
            209.4, 5.502e6, 0.0,        /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.6666666666666667,         /* gamma: 5/3, monatomic ideal gas (kinetic theory) */
            3.655e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* xenon */
    GK__ROW("xenon", "Xe",
            131.293e-3,                 /* M: 131.293 g/mol [AW] */
            289.74, 5.84e6, 0.0,        /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.6666666666666667,         /* gamma: 5/3, monatomic ideal gas (kinetic theory) */
            4.047e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* hydrogen */
    GK__ROW("hydrogen", "H2",
            2.016e-3,                   /* M: 2 x 1.008 g/mol [AW] */
            33.145, 1.2964e6, -0.216,   /* Tc, Pc: normal H2 Leachman et al., J. Phys. Chem. Ref. Data 38 (2009) 721 (reference EOS, from memory); omega [PPO5] */
            0.02452, 2.65e-05,          /* a, b: 0.2452 bar L2/mol2, 0.0265 L/mol [CRC-vdW-new] */
            1.4052,                     /* gamma: cp 28.836 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            2.827e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* carbon dioxide */
    GK__ROW("carbon dioxide", "CO2",
            44.009e-3,                  /* M: 12.011 + 2 x 15.999 g/mol [AW] */
            304.1282, 7.3773e6, 0.225,  /* Tc, Pc: Span and Wagner, J. Phys. Chem. Ref. Data 25 (1996) 1509 (reference EOS, from memory); omega [PPO5] */
            0.3658, 4.29e-05,           /* a, b: 3.658 bar L2/mol2, 0.0429 L/mol [CRC-vdW-new] */
            1.2885,                     /* gamma: cp 37.135 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.941e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* carbon monoxide */
    GK__ROW("carbon monoxide", "CO",
            28.01e-3,                   /* M: 12.011 + 15.999 g/mol [AW] */
            132.85, 3.494e6, 0.045,     /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.3992,                     /* gamma: cp 29.142 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.69e-10,                   /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* methane */
    GK__ROW("methane", "CH4",
            16.043e-3,                  /* M: 12.011 + 4 x 1.008 g/mol [AW] */
            190.564, 4.5992e6, 0.011,   /* Tc, Pc: Setzmann and Wagner, J. Phys. Chem. Ref. Data 20 (1991) 1061 (reference EOS, from memory); omega [PPO5] */
            0.2303, 4.31e-05,           /* a, b: 2.303 bar L2/mol2, 0.04310 L/mol [CRC-vdW] */
            1.3037,                     /* gamma: cp 35.69 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.758e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* ethane */
    GK__ROW("ethane", "C2H6",
            30.07e-3,                   /* M: 2 x 12.011 + 6 x 1.008 g/mol [AW] */
            305.322, 4.8722e6, 0.099,   /* Tc, Pc: Buecker and Wagner, J. Phys. Chem. Ref. Data 35 (2006) 205 (reference EOS, from memory); omega [PPO5] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.1882,                     /* gamma: cp 52.49 J/(mol K) [TRC, from memory], cp/(cp - R) */
            4.443e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* propane */
    GK__ROW("propane", "C3H8",
            44.097e-3,                  /* M: 3 x 12.011 + 8 x 1.008 g/mol [AW] */
            369.89, 4.2512e6, 0.152,    /* Tc, Pc: Lemmon et al., J. Chem. Eng. Data 54 (2009) 3141 (reference EOS, from memory); omega [PPO5] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.1274,                     /* gamma: cp 73.6 J/(mol K) [TRC, from memory], cp/(cp - R) */
            5.118e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* n-butane */
    GK__ROW("n-butane", "n-C4H10",
            58.124e-3,                  /* M: 4 x 12.011 + 10 x 1.008 g/mol [AW] */
            425.125, 3.796e6, 0.2,      /* Tc, Pc: Buecker and Wagner, J. Phys. Chem. Ref. Data 35 (2006) 929 (reference EOS, from memory); omega [PPO5] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.0922,                     /* gamma: cp 98.5 J/(mol K) [TRC, from memory], cp/(cp - R) */
            4.687e-10,                  /* sigma, m: [LJ, from memory] */
            "butane" "\0"),
    /* isobutane */
    GK__ROW("isobutane", "i-C4H10",
            58.124e-3,                  /* M: 4 x 12.011 + 10 x 1.008 g/mol [AW] */
            407.85, 3.64e6, 0.186,      /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.094,                      /* gamma: cp 96.8 J/(mol K) [TRC, from memory], cp/(cp - R) */
            5.278e-10,                  /* sigma, m: [LJ, from memory] */
            "2-methylpropane" "\0" "i-butane" "\0"),
    /* ethylene */
    GK__ROW("ethylene", "C2H4",
            28.054e-3,                  /* M: 2 x 12.011 + 4 x 1.008 g/mol [AW] */
            282.34, 5.041e6, 0.087,     /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.2404,                     /* gamma: cp 42.9 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            4.163e-10,                  /* sigma, m: [LJ, from memory] */
            "ethene" "\0"),
    /* propylene */
    GK__ROW("propylene", "C3H6",
            42.081e-3,                  /* M: 3 x 12.011 + 6 x 1.008 g/mol [AW] */
            364.9, 4.6e6, 0.142,        /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.1485,                     /* gamma: cp 64.32 J/(mol K) [TRC, from memory], cp/(cp - R) */
            4.678e-10,                  /* sigma, m: [LJ, from memory] */
            "propene" "\0"),
    /* acetylene */
    GK__ROW("acetylene", "C2H2",
            26.038e-3,                  /* M: 2 x 12.011 + 2 x 1.008 g/mol [AW] */
            308.3, 6.114e6, 0.189,      /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.2327,                     /* gamma: cp 44.04 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            4.033e-10,                  /* sigma, m: [LJ, from memory] */
            "ethyne" "\0"),
    /* ammonia */
    GK__ROW("ammonia", "NH3",
            17.031e-3,                  /* M: 14.007 + 3 x 1.008 g/mol [AW] */
            405.4, 11.353e6, 0.257,     /* Tc, Pc, omega: [PPO5, from memory] */
            0.4225, 3.713e-05,          /* a, b: 4.225 bar L2/mol2, 0.03713 L/mol [CRC-vdW] */
            1.3044,                     /* gamma: cp 35.63 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            2.9e-10,                    /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* water */
    GK__ROW("water", "H2O",
            18.015e-3,                  /* M: 2 x 1.008 + 15.999 g/mol [AW] */
            647.096, 22.064e6, 0.344,   /* Tc, Pc, omega: Tc, Pc [IAPWS]; omega [PPO5, from memory] */
            0.5537, 3.049e-05,          /* a, b: 5.537 bar L2/mol2, 0.03049 L/mol [CRC-vdW] */
            1.329,                      /* gamma: cp 33.588 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            2.641e-10,                  /* sigma, m: [LJ, from memory] */
            "water vapour" "\0" "water vapor" "\0"),
    /* hydrogen sulfide */
    GK__ROW("hydrogen sulfide", "H2S",
            34.076e-3,                  /* M: 2 x 1.008 + 32.06 g/mol [AW] */
            373.4, 8.963e6, 0.09,       /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.3213,                     /* gamma: cp 34.192 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.623e-10,                  /* sigma, m: [LJ, from memory] */
            "hydrogen sulphide" "\0"),
    /* sulfur dioxide */
    GK__ROW("sulfur dioxide", "SO2",
            64.058e-3,                  /* M: 32.06 + 2 x 15.999 g/mol [AW] */
            430.8, 7.884e6, 0.245,      /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.2634,                     /* gamma: cp 39.878 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            4.112e-10,                  /* sigma, m: [LJ, from memory] */
            "sulphur dioxide" "\0"),
    /* nitrous oxide */
    GK__ROW("nitrous oxide", "N2O",
            44.013e-3,                  /* M: 2 x 14.007 + 15.999 g/mol [AW] */
            309.6, 7.255e6, 0.165,      /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.2744,                     /* gamma: cp 38.617 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.828e-10,                  /* sigma, m: [LJ, from memory] */
            "dinitrogen monoxide" "\0"),
    /* nitric oxide */
    GK__ROW("nitric oxide", "NO",
            30.006e-3,                  /* M: 14.007 + 15.999 g/mol [AW] */
            180.15, 6.48e6, 0.583,      /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.3862,                     /* gamma: cp 29.845 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.492e-10,                  /* sigma, m: [LJ, from memory] */
            "nitrogen monoxide" "\0"),
    /* chlorine */
    GK__ROW("chlorine", "Cl2",
            70.9e-3,                    /* M: 2 x 35.45 g/mol [AW] */
            416.9, 7.991e6, 0.069,      /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.3243,                     /* gamma: cp 33.949 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            4.217e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* hydrogen chloride */
    GK__ROW("hydrogen chloride", "HCl",
            36.458e-3,                  /* M: 1.008 + 35.45 g/mol [AW] */
            324.69, 8.31e6, 0.132,      /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.3993,                     /* gamma: cp 29.136 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            3.339e-10,                  /* sigma, m: [LJ, from memory] */
            GK__NO_ALIAS),
    /* sulfur hexafluoride */
    GK__ROW("sulfur hexafluoride", "SF6",
            146.050418972e-3,           /* M: 32.06 + 6 x 18.998403162 g/mol [AW] */
            318.69, 3.76e6, 0.21,       /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.0938,                     /* gamma: cp 97.0 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            5.128e-10,                  /* sigma, m: [LJ, from memory] */
            "sulphur hexafluoride" "\0"),
    /* nitrogen trifluoride */
    GK__ROW("nitrogen trifluoride", "NF3",
            71.002209486e-3,            /* M: 14.007 + 3 x 18.998403162 g/mol [AW] */
            234.0, 4.46e6, 0.12,        /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.1844,                     /* gamma: cp 53.4 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            0.0,                        /* sigma: not known */
            GK__NO_ALIAS),
    /* carbon tetrafluoride */
    GK__ROW("carbon tetrafluoride", "CF4",
            88.004612648e-3,            /* M: 12.011 + 4 x 18.998403162 g/mol [AW] */
            227.51, 3.745e6, 0.179,     /* Tc, Pc, omega: [PPO5, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.1575,                     /* gamma: cp 61.09 J/(mol K) [JANAF, from memory], cp/(cp - R) */
            4.662e-10,                  /* sigma, m: [LJ, from memory] */
            "tetrafluoromethane" "\0"),
    /* 1,1,1,2-tetrafluoroethane */
    GK__ROW("1,1,1,2-tetrafluoroethane", "CH2FCF3",
            102.031612648e-3,           /* M: 2x12.011 + 2x1.008 + 4x18.998403162 [AW] */
            374.21, 4.0593e6, 0.3268,   /* Tc, Pc, omega: Tc, Pc [TRB94, from memory]; omega [TRB94, from memory] */
            0.0, 0.0,                   /* a, b: 0, derive from Tc, Pc */
            1.1068,                     /* gamma: cp 86.2 J/(mol K) [TRB94, from memory], cp/(cp - R) */
            0.0,                        /* sigma: not known */
            "r-134a" "\0" "r134a" "\0" "hfc-134a" "\0"),
};
/* clang-format on */

#define GK__GAS_COUNT (sizeof gk__gases / sizeof gk__gases[0])

/* Does text[0 .. n) equal the NUL-terminated b, exactly (fold = 0) or without regard to ASCII
   case (fold = 1)? Reads no further than n in text and than its NUL in b. */
static bool gk__same_n(const char *text, size_t n, const char *b, bool fold) {
    size_t i;
    for (i = 0; i < n; ++i) {
        char ca = text[i], cb = b[i];
        if (cb == '\0') { return false; }
        if (fold) {
            ca = gk__ascii_lower(ca);
            cb = gk__ascii_lower(cb);
        }
        if (ca != cb) { return false; }
    }
    return b[n] == '\0';
}

gk_status gk__gas_find_n(const char *text, size_t n, const gk_gas **out) {
    size_t i;
    const char *alias;
    /* Formulas first, exactly: "CO" must never fall through to a case-blind match. */
    for (i = 0; i < GK__GAS_COUNT; ++i) {
        if (gk__same_n(text, n, gk__gases[i].gas.formula, false)) {
            *out = &gk__gases[i].gas;
            return GK_OK;
        }
    }
    for (i = 0; i < GK__GAS_COUNT; ++i) {
        if (gk__same_n(text, n, gk__gases[i].gas.name, true)) {
            *out = &gk__gases[i].gas;
            return GK_OK;
        }
        alias = gk__gases[i].aliases;
        while (alias != NULL && *alias != '\0') {
            if (gk__same_n(text, n, alias, true)) {
                *out = &gk__gases[i].gas;
                return GK_OK;
            }
            while (*alias != '\0') { ++alias; }
            ++alias; /* past the NUL that ends this name */
        }
    }
    return GK_ERR_NOT_FOUND;
}

gk_status gk_gas_find(const char *name_or_formula, const gk_gas **out) {
    size_t n = 0;
    if (name_or_formula == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    /* bounded: reads at most GK_GAS_KEY_MAX + 1 characters, never past the NUL; a longer key
       names no gas */
    while ((n <= (size_t)GK_GAS_KEY_MAX) && (name_or_formula[n] != '\0')) { ++n; }
    if (n > (size_t)GK_GAS_KEY_MAX) { return GK_ERR_NOT_FOUND; }
    return gk__gas_find_n(name_or_formula, n, out);
}

size_t gk_gas_count(void) { return GK__GAS_COUNT; }

const gk_gas *gk_gas_at(size_t index) {
    return (index < GK__GAS_COUNT) ? &gk__gases[index].gas : NULL;
}
