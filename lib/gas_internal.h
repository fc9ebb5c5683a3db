/*
 * gas_internal.h - private interface of the gas table (gas.c). Never installed.
 */
#ifndef GASKIT_GAS_INTERNAL_H
#define GASKIT_GAS_INTERNAL_H

#include "gk_internal.h"

/* gk_gas_find() on the n characters text[0 .. n) (no NUL needed): the composition parser looks
   names up in place, without a copy. GK_OK (and *out) or GK_ERR_NOT_FOUND; the caller has
   checked text and out. */
gk_status gk__gas_find_n(const char *text, size_t n, const gk_gas **out);

#endif /* GASKIT_GAS_INTERNAL_H */
