/* startup.c - minimal Cortex-M4F start-up for the sample firmware: vector table, copy .data,
   clear .bss, enable the FPU (CP10/CP11 full access), call main. No heap, no C library init. */
#include <stdint.h>

int main(void);
void Reset_Handler(void);
void Default_Handler(void);

extern uint32_t _estack, _sidata, _sdata, _edata, _sbss, _ebss;

void Default_Handler(void) {
    for (;;) {
    }
}

void Reset_Handler(void) {
    const uint32_t *src = &_sidata;
    for (uint32_t *dst = &_sdata; dst < &_edata;) *dst++ = *src++;
    for (uint32_t *dst = &_sbss; dst < &_ebss;) *dst++ = 0u;
    /* SCB->CPACR (ARMv7-M Architecture Reference Manual, B3.2.20): CP10, CP11 full access. */
    *(volatile uint32_t *)0xE000ED88u |= (0xFu << 20);
    __asm volatile("dsb\n\tisb");
    (void)main();
    for (;;) {
    }
}

/* Initial stack pointer, reset and the 14 system exception vectors. */
__attribute__((section(".isr_vector"), used))
static void (*const vectors[16])(void) = {
    (void (*)(void))(uintptr_t)&_estack, Reset_Handler,
    Default_Handler, Default_Handler, Default_Handler, Default_Handler, Default_Handler,
    0, 0, 0, 0, Default_Handler, Default_Handler, 0, Default_Handler, Default_Handler,
};
