/** Pure functions of the physics: motor laws, PWM ripple, switch losses, thermal networks. No I/O. */
package dev.yoke.physics;
