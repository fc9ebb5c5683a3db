# check-exports.cmake - ctest check that libgaskit.so exports only gk_ symbols.
#   cmake -DNM=<nm> -DLIB=<libgaskit.so> -P check-exports.cmake
# Allowed: defined dynamic symbols named gk_*, and the version node of cmake/gaskit.map
# (GASKIT_<n>, an absolute symbol). Anything else is an accidental export.
execute_process(COMMAND ${NM} -D --defined-only ${LIB}
  OUTPUT_VARIABLE _out RESULT_VARIABLE _rc)
if(NOT _rc EQUAL 0)
  message(FATAL_ERROR "${NM} -D failed on ${LIB}")
endif()
string(REPLACE "\n" ";" _lines "${_out}")
set(_bad "")
set(_good 0)
foreach(_l ${_lines})
  if(_l MATCHES "^[0-9a-fA-F]* *([A-Za-z]) ([^ @]+)")
    set(_type ${CMAKE_MATCH_1})
    set(_name ${CMAKE_MATCH_2})
    if(_name MATCHES "^gk_[a-z0-9][a-z0-9_]*$")
      math(EXPR _good "${_good} + 1")
    elseif(_type STREQUAL "A" AND _name MATCHES "^GASKIT_[0-9.]+$")
      # symbol-version node
    else()
      list(APPEND _bad "${_l}")
    endif()
  endif()
endforeach()
if(_bad)
  string(REPLACE ";" "\n  " _bad "${_bad}")
  message(FATAL_ERROR "libgaskit.so exports symbols outside gk_:\n  ${_bad}")
endif()
if(_good EQUAL 0)
  message(FATAL_ERROR "libgaskit.so exports no gk_ symbol at all")
endif()
message(STATUS "libgaskit.so exports ${_good} symbols, all gk_")
