/// @file promote.hpp
/// @brief Mixed argument types for the formula templates: `pumploss::gap_plates_flow(1e5, 0.04,
/// 0.01, 10e-6, 0.02, 0)` with an int literal beside doubles compiles and runs in double.
///
/// Promotion as Boost.Math promotes the arguments of its special functions
/// (boost::math::tools::promote_args): every integer becomes double; among floating types the
/// widest wins (float < double < long double); a type that is not a built-in arithmetic type (a
/// pumploss::dual or a Boost.Multiprecision number) wins over every built-in one. Two different
/// non-built-in types do not mix (the call does not compile).
///
/// Each header ends with a block of PUMPLOSS_PROMOTE(name) lines, one per public template whose
/// parameters are all scalars. The line adds a forwarding overload
/// `template <class... A> auto name(const A&... a)` that converts every argument to
/// promote_args_t<A...> and calls the original. It takes part only when the argument types
/// differ from their promoted type, and partial ordering prefers the original `name(T, T, ...)`
/// whenever all arguments already share one type, so same-type calls are untouched.
/// All-integer calls (`f(1, 2)`) promote too, to double, as in Boost.Math: each such
/// template is declared `template <class T, detail::if_real<T> = 0>`, which takes it out of the
/// overload set for an integer T, so the forwarding overload converts the integers and calls
/// it in double.
#ifndef PUMPLOSS_PROMOTE_HPP
#define PUMPLOSS_PROMOTE_HPP

#include <cstddef>
#include <limits>
#include <type_traits>

namespace pumploss {

template <class T, std::size_t N>
struct dual;

namespace detail {

/// True for pumploss::dual types.
template <class T>
struct is_dual : std::false_type {};
/// True for pumploss::dual types.
template <class V, std::size_t N>
struct is_dual<dual<V, N>> : std::true_type {};
/// True for pumploss::dual types.
template <class T>
inline constexpr bool is_dual_v = is_dual<T>::value;

/// The value type under a scalar: V for dual<V, N>, T otherwise.
template <class T>
struct value_type_of {
  using type = T;  ///< the value type
};
/// The value type under a scalar: V for dual<V, N>.
template <class V, std::size_t N>
struct value_type_of<dual<V, N>> {
  using type = V;  ///< the value type
};
/// The value type under a scalar.
template <class T>
using value_type_of_t = typename value_type_of<T>::type;

/// True for the scalar types a formula template accepts: built-in arithmetic types other than
/// bool, dual numbers, and types with a std::numeric_limits specialisation (multiprecision).
template <class A>
struct promote_scalar
    : std::bool_constant<(std::is_arithmetic_v<A> && !std::is_same_v<A, bool>) || is_dual_v<A> ||
                         (!std::is_arithmetic_v<A> && std::numeric_limits<A>::is_specialized)> {};

/// In the template parameter list of a formula template that has a PUMPLOSS_PROMOTE line:
/// `template <class T, detail::if_real<T> = 0>`. An integer T (an all-integer call) is not
/// taken, so the call goes to the forwarding overload and runs in double.
template <class T>
using if_real = std::enable_if_t<!std::is_integral_v<T>, int>;

/// One argument type after promotion: integers become double.
template <class A>
using promote_one_t = std::conditional_t<std::is_integral_v<A>, double, A>;

/// Two promoted types combined: equal types stay; a non-built-in type wins; else the wider.
template <class A, class B, class = void>
struct promote_two {
  using type = void;  ///< two different non-built-in types: no common type
};
/// Equal types.
template <class A>
struct promote_two<A, A, void> {
  using type = A;  ///< the type itself
};
/// Different types, at least one built-in.
template <class A, class B>
struct promote_two<A, B,
                   std::enable_if_t<!std::is_same_v<A, B> &&
                                    (std::is_floating_point_v<A> || std::is_floating_point_v<B>)>> {
  using type = std::conditional_t<
      !std::is_floating_point_v<A>, A,
      std::conditional_t<!std::is_floating_point_v<B>, B,
                         std::conditional_t<(std::numeric_limits<A>::digits >= std::numeric_limits<B>::digits), A,
                                            B>>>;  ///< the non-built-in or the wider type
};

/// Fold of promote_two over all arguments.
template <class... A>
struct promote_args;
/// One argument.
template <class A>
struct promote_args<A> {
  using type = promote_one_t<A>;  ///< the promoted type
};
/// Several arguments.
template <class A, class B, class... R>
struct promote_args<A, B, R...> {
  using type = typename promote_args<typename promote_two<promote_one_t<A>, promote_one_t<B>>::type,
                                     R...>::type;  ///< the promoted type
};
/// A void on the way stays void (no common type).
template <class B, class... R>
struct promote_args<void, B, R...> {
  using type = void;  ///< no common type
};

/// True when every argument is a scalar, they share a promoted type, and at least one of them
/// is not already of that type (so the forwarding overload has something to do).
template <class... A>
struct promote_needed {
  /// the promoted type, or void
  using type = typename promote_args<A...>::type;
  /// whether the forwarding overload applies
  static constexpr bool value = sizeof...(A) > 0 && (promote_scalar<A>::value && ...) &&
                                !std::is_void_v<type> && !(std::is_same_v<A, type> && ...);
};

}  // namespace detail

/// The type Boost.Math would compute in for arguments of types A...: integers as double, the
/// widest floating type, or the one non-built-in type (dual, multiprecision).
template <class... A>
using promote_args_t = typename detail::promote_args<A...>::type;

}  // namespace pumploss

#if defined(PUMPLOSS_DOXYGEN)
/// Adds the mixed-argument overload of the formula template `name` (see promote.hpp). Place it
/// after the template, in namespace pumploss.
#define PUMPLOSS_PROMOTE(name)
#else
#define PUMPLOSS_PROMOTE(name)                                                                         \
  template <class... PromoteA, std::enable_if_t<::pumploss::detail::promote_needed<PromoteA...>::value, \
                                                int> = 0>                                             \
  inline auto name(const PromoteA&... promote_a)                                                      \
      ->decltype(name(static_cast<::pumploss::promote_args_t<PromoteA...>>(promote_a)...)) {           \
    return name(static_cast<::pumploss::promote_args_t<PromoteA...>>(promote_a)...);                   \
  }
#endif

#endif
