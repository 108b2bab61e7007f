# airwright_set_warnings(target): the project's warning set, -Werror when asked.
function(airwright_set_warnings target)
    target_compile_options(${target} PRIVATE -Wall -Wextra -Wpedantic -Wshadow -Wconversion
                                             -Wno-sign-conversion -Wnon-virtual-dtor -Wold-style-cast
                                             -Woverloaded-virtual -Wnull-dereference)
    # GCC 12 at -O2/-O3 reports -Wrestrict inside libstdc++'s std::string
    # concatenation (GCC bug 105329), -Wnull-dereference inside std::string's
    # inlined constructors, and with the sanitizers -Wmaybe-uninitialized on
    # std::optional members: false positives we cannot fix in our code.
    if(CMAKE_CXX_COMPILER_ID STREQUAL "GNU" AND CMAKE_CXX_COMPILER_VERSION VERSION_LESS 13)
        target_compile_options(${target} PRIVATE -Wno-restrict -Wno-null-dereference)
        if(AIRWRIGHT_SANITIZE)
            target_compile_options(${target} PRIVATE -Wno-maybe-uninitialized)
        endif()
    endif()
    if(AIRWRIGHT_WERROR)
        target_compile_options(${target} PRIVATE -Werror)
    endif()
endfunction()
