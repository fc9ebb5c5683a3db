/**
 * @file gaskit.h
 * @brief The umbrella header of gaskit: include this one.
 *
 * gaskit turns pressure, temperature, volume and time readings into amounts, densities,
 * standard volumes, molecular speeds, effusion rates and mixture properties. C99, no heap,
 * no global state; every computing function returns a gk_status and writes its outputs only
 * on GK_OK.
 */
#ifndef GASKIT_GASKIT_H
#define GASKIT_GASKIT_H

#include "gaskit/base.h"
#include "gaskit/units.h"
#include "gaskit/ideal.h"
#include "gaskit/kinetic.h"
#include "gaskit/gas.h"
#include "gaskit/eos.h"
#include "gaskit/mixture.h"
#include "gaskit/water.h"
#include "gaskit/reference.h"
#include "gaskit/batch.h"
#include "gaskit/instrument.h"

#endif /* GASKIT_GASKIT_H */
