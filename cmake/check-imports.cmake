# check-imports.cmake - ctest check that libgaskit.a calls nothing outside the library but the
# <math.h> functions (the API contract: C99 with <math.h> only; no heap, stdio, errno, locale).
#   cmake -DNM=<nm> -DLIB=<libgaskit.a> -P check-imports.cmake
# Allowed undefined symbols: the library's own gk_ / gk__ functions, the math functions below
# (double and float names), and strlen, memcpy and memset, which compilers emit on their own
# for a hand-written length loop, a struct copy or a struct initialisation (every C runtime,
# newlib included, provides them).
cmake_minimum_required(VERSION 3.16)
execute_process(COMMAND ${NM} -u ${LIB} OUTPUT_VARIABLE _out RESULT_VARIABLE _rc)
if(NOT _rc EQUAL 0)
  message(FATAL_ERROR "${NM} -u failed on ${LIB}")
endif()
set(_math acos cbrt copysign cos exp expm1 fabs fma frexp ldexp log log1p pow sqrt)
string(REPLACE "\n" ";" _lines "${_out}")
set(_bad "")
foreach(_l ${_lines})
  if(_l MATCHES "^ *U ([A-Za-z_][A-Za-z0-9_]*)")
    set(_name ${CMAKE_MATCH_1})
    string(REGEX REPLACE "f$" "" _base "${_name}")
    if(_name MATCHES "^gk_" OR _name MATCHES "^(strlen|memcpy|memset)$")
    elseif(_name IN_LIST _math OR _base IN_LIST _math)
    else()
      list(APPEND _bad "${_name}")
    endif()
  endif()
endforeach()
if(_bad)
  list(REMOVE_DUPLICATES _bad)
  string(REPLACE ";" " " _bad "${_bad}")
  message(FATAL_ERROR "libgaskit.a calls outside <math.h>: ${_bad}")
endif()
message(STATUS "libgaskit.a calls only its own functions and <math.h>")
