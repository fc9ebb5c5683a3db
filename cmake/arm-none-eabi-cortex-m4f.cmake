# Cross toolchain: Cortex-M4F with single-precision FPU, Debian's gcc-arm-none-eabi.
# cmake -B build-m4 -DCMAKE_TOOLCHAIN_FILE=cmake/arm-none-eabi-cortex-m4f.cmake \
#       -DGASKIT_SINGLE_PRECISION=ON -DGASKIT_SHARED=OFF -DGASKIT_TESTS=OFF
set(CMAKE_SYSTEM_NAME Generic)
set(CMAKE_SYSTEM_PROCESSOR arm)
set(CMAKE_C_COMPILER arm-none-eabi-gcc)
set(CMAKE_TRY_COMPILE_TARGET_TYPE STATIC_LIBRARY)
set(GASKIT_M4F_FLAGS "-mcpu=cortex-m4 -mthumb -mfloat-abi=hard -mfpu=fpv4-sp-d16 -ffunction-sections -fdata-sections")
set(CMAKE_C_FLAGS_INIT "${GASKIT_M4F_FLAGS}")
set(CMAKE_EXE_LINKER_FLAGS_INIT "--specs=nano.specs --specs=nosys.specs -Wl,--gc-sections")
set(CMAKE_FIND_ROOT_PATH_MODE_PROGRAM NEVER)
set(CMAKE_FIND_ROOT_PATH_MODE_LIBRARY ONLY)
set(CMAKE_FIND_ROOT_PATH_MODE_INCLUDE ONLY)
set(GASKIT_EXAMPLES OFF CACHE BOOL "" FORCE)
