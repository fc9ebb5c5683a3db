# Cross toolchain: 32-bit ARM Linux (armhf), Debian's crossbuild-essential-armhf; ctest runs the
# test programs under qemu-user. Needs libcmocka-dev:armhf (dpkg --add-architecture armhf).
# cmake -B build-armhf -DCMAKE_TOOLCHAIN_FILE=cmake/arm-linux-gnueabihf.cmake
set(CMAKE_SYSTEM_NAME Linux)
set(CMAKE_SYSTEM_PROCESSOR arm)
set(CMAKE_C_COMPILER arm-linux-gnueabihf-gcc)
set(CMAKE_LIBRARY_ARCHITECTURE arm-linux-gnueabihf)
set(CMAKE_FIND_ROOT_PATH /usr/arm-linux-gnueabihf)
set(CMAKE_FIND_ROOT_PATH_MODE_PROGRAM NEVER)
set(CMAKE_FIND_ROOT_PATH_MODE_LIBRARY BOTH)
set(CMAKE_FIND_ROOT_PATH_MODE_INCLUDE BOTH)
set(CMAKE_FIND_ROOT_PATH_MODE_PACKAGE ONLY)
# libc6:armhf (pulled in by libcmocka-dev:armhf) provides the loader, so qemu needs no -L
# (with -L /usr/arm-linux-gnueabihf, qemu 7.2 crashes in pthread_create).
set(CMAKE_CROSSCOMPILING_EMULATOR qemu-arm)
